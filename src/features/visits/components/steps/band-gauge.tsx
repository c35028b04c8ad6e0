import type { CSSProperties } from 'react';
import type { EntryJudgement } from '@shared/domain/judge-entry';
import { formatSi } from '@shared/domain/format-quantity';
import type { BandSetValues } from '@shared/schemas/band-set';
import type { Circuit, Quantity } from '@shared/schemas/reading';
import { cn } from '@/lib/cn';

type Judged = Extract<EntryJudgement, { status: 'judged' }>;

interface Scale {
  quantity: Quantity;
  nominal: number | null;
  inLow: number;
  inHigh: number;
  nearLow: number;
  nearHigh: number;
}

function scaleFor(quantity: Quantity, circuit: Circuit, bands: BandSetValues): Scale {
  if (quantity === 'resistance') {
    const w = bands.windings[circuit];
    return {
      quantity,
      nominal: w.nominal,
      inLow: w.nominal * (1 - w.inBandPercent / 100),
      inHigh: w.nominal * (1 + w.inBandPercent / 100),
      nearLow: w.nominal * (1 - w.nearEdgePercent / 100),
      nearHigh: w.nominal * (1 + w.nearEdgePercent / 100),
    };
  }
  const range = circuit === 'rotor' ? bands.excitation : bands.statorOutputMagnitude;
  return {
    quantity,
    nominal: null,
    inLow: range.min,
    inHigh: range.max,
    nearLow: range.min * (1 - range.nearEdgePercent / 100),
    nearHigh: range.max * (1 + range.nearEdgePercent / 100),
  };
}

/** The value the verdict was reached on: winding resistance at reference temperature, or the judged voltage. */
function judgedValue(j: Judged): number | null {
  return j.figures.kind === 'resistance' ? j.figures.atReference : j.figures.judged;
}

interface BandGaugeProps {
  judgement: Judged;
  quantity: Quantity;
  circuit: Circuit;
  bands: BandSetValues;
}

/**
 * Where a reading falls against its band: out-of-band on both sides, the near-edge margins and
 * the in-band zone, each named in words as well as shaded.
 */
export function BandGauge({ judgement, quantity, circuit, bands }: BandGaugeProps) {
  const s = scaleFor(quantity, circuit, bands);
  const margin = (s.nearHigh - s.nearLow) * 0.4;
  const lo = Math.max(0, s.nearLow - margin);
  const hi = s.nearHigh + margin;
  const pct = (v: number) => Math.min(100, Math.max(0, ((v - lo) / (hi - lo)) * 100));
  const at = (v: number): CSSProperties => ({ left: `${pct(v)}%` });
  const fmt = (v: number) => formatSi(v, quantity);

  const value = judgedValue(judgement);
  const isOpen = value === null && judgement.verdict === 'open';
  const markerPct = value !== null ? pct(value) : isOpen || judgement.direction === 'high' ? 100 : 0;
  const offScale = value === null || value < lo || value > hi;
  const shown = value !== null ? fmt(value) : isOpen ? 'OL (open)' : 'off the meter’s range';
  const where = quantity === 'resistance' ? ' at reference temperature' : '';
  const summary =
    `Band gauge: reading ${shown}${value !== null ? where : ''}; ` +
    `in band ${fmt(s.inLow)} to ${fmt(s.inHigh)}, near edge ${fmt(s.nearLow)} to ${fmt(s.nearHigh)}` +
    (s.nominal !== null ? `, nominal ${fmt(s.nominal)}` : '');

  const zones = [
    { from: lo, to: s.nearLow, label: 'out', tone: 'bg-verdict-out_of_band-soft' },
    { from: s.nearLow, to: s.inLow, label: 'near', tone: 'bg-verdict-near_edge-soft' },
    { from: s.inLow, to: s.inHigh, label: 'in band', tone: 'bg-verdict-in_band-soft' },
    { from: s.inHigh, to: s.nearHigh, label: 'near', tone: 'bg-verdict-near_edge-soft' },
    { from: s.nearHigh, to: hi, label: 'out', tone: 'bg-verdict-out_of_band-soft' },
  ];

  return (
    <figure role="img" aria-label={summary} className="w-full pb-1 pt-7">
      <div aria-hidden="true" className="relative h-10 rounded-md border-2 border-surface-edge">
        {zones.map((z, i) => (
          <div
            key={i}
            className={cn('absolute inset-y-0 flex items-center justify-center overflow-hidden text-sm font-semibold text-ink', z.tone)}
            style={{ left: `${pct(z.from)}%`, width: `${pct(z.to) - pct(z.from)}%` }}
          >
            {z.label}
          </div>
        ))}
        {s.nominal !== null && <div className="absolute inset-y-0 w-0.5 bg-ink-muted" style={at(s.nominal)} />}
        <div data-testid="gauge-marker" className="absolute -top-7 bottom-0 flex -translate-x-1/2 flex-col items-center" style={{ left: `${markerPct}%` }}>
          <span className="whitespace-nowrap rounded bg-ink px-1.5 text-sm font-bold text-ink-inverse">
            {offScale && markerPct === 0 ? '◀ ' : ''}
            {value !== null ? fmt(value) : 'OL'}
            {offScale && markerPct === 100 ? ' ▶' : ''}
          </span>
          <span className="w-1 flex-1 bg-ink" />
        </div>
      </div>
      {s.nominal !== null && (
        <div aria-hidden="true" className="relative mt-1 h-6 text-sm">
          <span className="absolute -translate-x-1/2 whitespace-nowrap font-semibold text-ink" style={at(s.nominal)}>
            nom. {fmt(s.nominal)}
          </span>
        </div>
      )}
      {/* Edge values under their ticks where there is room; on a phone they collide, so they are listed instead. */}
      {[
        [s.inLow, s.inHigh],
        [s.nearLow, s.nearHigh],
      ].map((pair, row) => (
        <div key={row} aria-hidden="true" className="relative hidden h-6 text-sm text-ink-muted sm:block">
          {pair.map((v) => (
            <span key={v} className="absolute -translate-x-1/2 whitespace-nowrap" style={at(v)}>
              {fmt(v)}
            </span>
          ))}
        </div>
      ))}
      <p aria-hidden="true" className="mt-1 text-sm text-ink-muted sm:hidden">
        in band {fmt(s.inLow)}–{fmt(s.inHigh)} · near edge {fmt(s.nearLow)}–{fmt(s.nearHigh)}
      </p>
    </figure>
  );
}
