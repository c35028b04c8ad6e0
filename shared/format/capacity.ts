// Press capacity in the one unit a customer chose, US (short) tons or metric tonnes, printed the
// same way by every screen, the record, the PDF and the e-mail.

export const CAPACITY_UNITS = ['us_ton', 'tonne'] as const;
export type CapacityUnit = (typeof CAPACITY_UNITS)[number];

/** Kilograms in one unit: 1 US ton = 2,000 lb × 0.45359237 kg/lb = 907.18474 kg exactly (NIST); 1 t = 1,000 kg. */
export const KILOGRAMS_PER: Record<CapacityUnit, number> = { us_ton: 907.18474, tonne: 1000 };

/** The unit as a person chooses it. */
export const CAPACITY_UNIT_LABELS: Record<CapacityUnit, string> = {
  us_ton: 'US tons (short tons of 2,000 lb)',
  tonne: 'Tonnes (metric, 1,000 kg)',
};

/** The unit's name in a field label: "Capacity (US tons)". */
export const CAPACITY_UNIT_NAMES: Record<CapacityUnit, string> = { us_ton: 'US tons', tonne: 'tonnes' };

/** A capacity in another unit, exactly (no rounding). */
export function convertCapacity(value: number, from: CapacityUnit, to: CapacityUnit): number {
  if (from === to) return value;
  return (value * KILOGRAMS_PER[from]) / KILOGRAMS_PER[to];
}

/** "250 US tons", "1 US ton", "227 t": the symbol t is the tonne's (SI); a US ton has none, so it is named. */
export function formatCapacity(value: number, unit: CapacityUnit): string {
  const number = value.toLocaleString('en-US', { maximumFractionDigits: 1 });
  if (unit === 'tonne') return `${number} t`;
  return `${number} ${value === 1 ? 'US ton' : 'US tons'}`;
}
