import type { Quantity } from '../schemas/reading';

const PREFIXES = [
  { factor: 1e6, symbol: 'M' },
  { factor: 1e3, symbol: 'k' },
  { factor: 1, symbol: '' },
  { factor: 1e-3, symbol: 'm' },
] as const;

export const UNIT_SYMBOL: Record<Quantity, string> = { resistance: 'Ω', ac_voltage: 'V' };

/** Formats an SI value with an engineering prefix and four significant figures, e.g. 88.40 Ω, 1.200 MΩ. */
export function formatSi(value: number, quantity: Quantity): string {
  const unit = UNIT_SYMBOL[quantity];
  if (value === 0) return `0 ${unit}`;
  const magnitude = Math.abs(value);
  const prefix = PREFIXES.find((p) => magnitude >= p.factor) ?? PREFIXES[PREFIXES.length - 1]!;
  const scaled = value / prefix.factor;
  return `${Number(scaled.toPrecision(4)).toString()} ${prefix.symbol}${unit}`;
}

/** One decimal unless the number is small, for percentages in reasons. */
export function formatPercent(percent: number): string {
  const rounded = Math.abs(percent) < 1 ? percent.toFixed(2) : percent.toFixed(1);
  return `${rounded} %`;
}
