import type { Quantity } from '../schemas/reading';

/** What a typed reading means: an SI value, or the meter's over-range display (OL). */
export type ParsedEntry =
  | { ok: true; kind: 'value'; value: number }
  | { ok: true; kind: 'over_range' }
  | { ok: false; error: string };

// SI prefixes are case-sensitive (m is milli, M is mega); K is accepted for kilo as meters print it.
const PREFIX_FACTORS: Record<string, number> = {
  G: 1e9,
  M: 1e6,
  k: 1e3,
  K: 1e3,
  m: 1e-3,
  u: 1e-6,
  µ: 1e-6,
  μ: 1e-6,
};

const UNIT_WORDS: Record<Quantity, RegExp> = {
  resistance: /^(Ω|ohms?)$/i,
  ac_voltage: /^(v|volts?|vac|v ?ac|v ?rms|v~)$/i,
};
const DC_VOLTS = /^(vdc|v ?dc|v ?=)$/i;

const OVER_RANGE = /^[o0] ?\.? ?l ?\.?$/i;
const NUMBER_THEN_REST = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?) ?(.*)$/i;

const HELP: Record<Quantity, string> = {
  resistance: 'Type a number such as 89.3, optionally with a unit (Ω, kΩ, MΩ), or OL when the meter shows OL.',
  ac_voltage: 'Type a number such as 4.2, optionally with a unit (V or mV).',
};
const WRONG_QUANTITY: Record<Quantity, string> = {
  resistance: 'That is a voltage; this field takes a resistance in Ω, kΩ or MΩ.',
  ac_voltage: 'That is a resistance; this field takes an AC voltage in V or mV.',
};

function normalise(entered: string): string {
  // The ohm sign (U+2126) and Greek capital omega look alike; meters and keyboards use both.
  return entered.replace(/\u2126/g, 'Ω').replace(/\s+/g, ' ').trim();
}

/** Factor for a unit suffix in this quantity's field, or an error message. */
function unitFactor(suffix: string, quantity: Quantity): number | string {
  if (suffix === '') return 1;
  const other: Quantity = quantity === 'resistance' ? 'ac_voltage' : 'resistance';
  const prefixOnly = PREFIX_FACTORS[suffix];
  if (prefixOnly !== undefined) return prefixOnly;
  const head = suffix.charAt(0);
  const tail = suffix.slice(1).trim();
  const candidates: Array<[number, string]> = [[1, suffix]];
  const prefixed = PREFIX_FACTORS[head];
  if (prefixed !== undefined && tail !== '') candidates.push([prefixed, tail]);
  for (const [factor, unit] of candidates) {
    if (UNIT_WORDS[quantity].test(unit)) return factor;
  }
  for (const [, unit] of candidates) {
    if (UNIT_WORDS[other].test(unit)) return WRONG_QUANTITY[quantity];
    if (DC_VOLTS.test(unit)) {
      return quantity === 'ac_voltage'
        ? 'That is DC: set the meter to AC volts (V~) and read again.'
        : WRONG_QUANTITY[quantity];
    }
  }
  return HELP[quantity];
}

/**
 * Parses what a technician typed into a reading field. A decimal comma is refused rather than
 * guessed, because "1,200" could be a thousands separator and a 1000× error decides nothing well.
 */
export function parseEntry(entered: string, quantity: Quantity): ParsedEntry {
  const text = normalise(entered);
  if (text === '') return { ok: false, error: `The reading is empty. ${HELP[quantity]}` };
  if (OVER_RANGE.test(text)) return { ok: true, kind: 'over_range' };
  if (text.includes(',')) {
    return { ok: false, error: 'Use a point for decimals: type 4.2, not 4,2 (and no thousands separators).' };
  }
  const match = NUMBER_THEN_REST.exec(text);
  if (!match) return { ok: false, error: HELP[quantity] };
  const number = Number(match[1]);
  if (number < 0 || Object.is(number, -0)) {
    return { ok: false, error: 'A reading cannot be negative: type the value the meter shows, without a sign.' };
  }
  const factor = unitFactor((match[2] ?? '').trim(), quantity);
  if (typeof factor === 'string') return { ok: false, error: factor };
  const value = number * factor;
  if (!Number.isFinite(value)) return { ok: false, error: `That number is too large. ${HELP[quantity]}` };
  return { ok: true, kind: 'value', value };
}
