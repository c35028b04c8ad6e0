import { returnToServiceDistances, type DeviceDistance } from '@shared/domain/return-to-service';
import { SAFEGUARD_NAMES } from '@shared/record/record-wording';
import type { TwoHandDevice } from '@shared/schemas/visit';

/** A typed number, or null unless it is a usable positive number no larger than `max`. */
export function typedNumber(text: unknown, max: number): number | null {
  if (typeof text !== 'string' && typeof text !== 'number') return null;
  const value = Number(String(text).trim());
  return String(text).trim() !== '' && Number.isFinite(value) && value > 0 && value <= max ? value : null;
}

/** Parses the typed stopping time; null unless it is a usable number of milliseconds. */
export const stoppingTimeMs = (text: unknown) => typedNumber(text, 5000);

interface Typed {
  stoppingTimeMs?: unknown;
  presenceSensingDistanceOk?: unknown;
  twoHandDevice?: unknown;
  strokesPerMinute?: unknown;
  engagingPoints?: unknown;
}

/** The figures typed so far, as the engine takes them; what is not usable yet is left out. */
function distancesFor(values: Typed | undefined): DeviceDistance[] {
  if (!values) return [];
  const points = typedNumber(values.engagingPoints, 24);
  return returnToServiceDistances({
    stoppingTimeMs: stoppingTimeMs(values.stoppingTimeMs) ?? undefined,
    // Shown as soon as a stopping time is typed, unless the technician says no such device is fitted.
    presenceSensingDistanceOk: values.presenceSensingDistanceOk === 'not_fitted' ? 'not_fitted' : 'yes',
    twoHandDevice: (['control', 'trip'].includes(values.twoHandDevice as string) ? values.twoHandDevice : 'not_fitted') as TwoHandDevice,
    strokesPerMinute: typedNumber(values.strokesPerMinute, 2000) ?? undefined,
    engagingPoints: points !== null && Number.isInteger(points) ? points : undefined,
  });
}

/**
 * The minimum safety distance of each safeguarding device the typed figures call for, for the
 * technician to compare with where each device actually sits. Information, not a sign-off.
 */
export function SafetyDistanceNote({ values }: { values: Typed | undefined }) {
  const distances = distancesFor(values);
  if (distances.length === 0) return null;
  return (
    <div aria-live="polite" className="space-y-3 rounded-lg border-2 border-accent bg-accent-soft p-4 text-lg text-ink">
      {distances.map((d) => (
        <div key={d.device} className="space-y-1">
          <p>
            {SAFEGUARD_NAMES[d.device]}: minimum safety distance{' '}
            <strong>
              {d.inches.toFixed(1)} in ({d.millimetres.toFixed(1)} mm)
            </strong>
          </p>
          <p className="text-base">
            {d.standard}: {d.formula}
            {d.device === 'two_hand_trip' ? '' : ', with the stopping time measured at about 90° of crank rotation'}; rounded up.
          </p>
        </div>
      ))}
      <p className="text-base">
        Compare each with the device’s actual mounting distance. The plant’s safeguarding assessment may use ANSI B11.19 or ISO 13855,
        which add the device’s response time and a depth-penetration allowance.
      </p>
    </div>
  );
}
