import { inchesToMillimetres, oshaPresenceSensingDistance } from '@shared/domain/safety-distance';

// A minimum distance is rounded up, never down; the small allowance keeps 6.3000000001 at 6.3.
const roundUpTenth = (value: number) => Math.ceil(value * 10 - 1e-9) / 10;

/** Parses the typed stopping time; null unless it is a usable number of milliseconds. */
export function stoppingTimeMs(text: unknown): number | null {
  if (typeof text !== 'string' && typeof text !== 'number') return null;
  const ms = Number(String(text).trim());
  return String(text).trim() !== '' && Number.isFinite(ms) && ms > 0 && ms <= 5000 ? ms : null;
}

/**
 * The presence-sensing device distance that the measured stopping time calls for, for the
 * technician to compare with where the device actually sits. Information, not a sign-off.
 */
export function SafetyDistanceNote({ stoppingTime }: { stoppingTime: unknown }) {
  const ms = stoppingTimeMs(stoppingTime);
  if (ms === null) return null;
  const result = oshaPresenceSensingDistance(ms / 1000);
  const inches = roundUpTenth(result.distance);
  const millimetres = roundUpTenth(inchesToMillimetres(result.distance));

  return (
    <div aria-live="polite" className="space-y-1 rounded-lg border-2 border-accent bg-accent-soft p-4 text-lg text-ink">
      <p>
        Minimum safety distance for a stopping time of {ms} ms:{' '}
        <strong>
          {inches.toFixed(1)} in ({millimetres.toFixed(1)} mm)
        </strong>
      </p>
      <p className="text-base">
        {result.standard}: {result.formula}, with the stopping time measured at about 90° of crank rotation; rounded up.
        Compare it with the device’s actual mounting distance. The plant’s safeguarding assessment may use ANSI B11.19 or
        ISO 13855, which add the device’s response time and a depth-penetration allowance.
      </p>
    </div>
  );
}
