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
 * The largest value a handheld multimeter can show, with margin (common practice, no published
 * source: top resistance ranges are tens of MΩ; handheld meters are rated up to 1000 V). Anything
 * above is a typing or prefix slip, refused before it can become a verdict.
 */
export const PLAUSIBLE_MAX: Record<Quantity, number> = { resistance: 1e9, ac_voltage: 1000 };
const TOO_LARGE: Record<Quantity, string> = {
  resistance: 'is more than a multimeter can show (their top range is tens of MΩ). Check the digits and the prefix; if the meter shows OL or a lone 1, type OL.',
  ac_voltage: 'is more than this test can see (the sensor circuit works at a few volts). Check the digits and the prefix (m is milli).',
};

// One comma followed by anything but exactly three digits cannot be a thousands separator.
const DECIMAL_COMMA = /^([+-]?\d*),(\d{1,2}|\d{4,})(?!\d)(.*)$/;

function commaAsPoint(text: string): string | { error: string } {
  if (!text.includes(',')) return text;
  const match = text.includes('.') || (text.match(/,/g) ?? []).length > 1 ? null : DECIMAL_COMMA.exec(text);
  if (!match) {
    return { error: 'A comma here could be a thousands separator: type the reading with a point for decimals (1.200 or 1200), without separators.' };
  }
  return `${match[1] || '0'}.${match[2]}${match[3]}`;
}

/**
 * Parses what a technician typed into a reading field. A decimal comma (as many tablet keypads
 * offer) is read as a point when it cannot be a thousands separator: "4,2" is 4.2, but "1,200"
 * is refused, because a 1000× error decides nothing well.
 */
export function parseEntry(entered: string, quantity: Quantity): ParsedEntry {
  const normalised = normalise(entered);
  if (normalised === '') return { ok: false, error: `The reading is empty. ${HELP[quantity]}` };
  if (OVER_RANGE.test(normalised)) return { ok: true, kind: 'over_range' };
  const text = commaAsPoint(normalised);
  if (typeof text !== 'string') return { ok: false, error: text.error };
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
  if (value > PLAUSIBLE_MAX[quantity]) return { ok: false, error: `${normalised} ${TOO_LARGE[quantity]}` };
  return { ok: true, kind: 'value', value };
}

export type EntryQuestion = { kind: 'lone_one' | 'below_one_ohm'; question: string };

/**
 * Readings that are legal but often mean something else, asked about before they are saved: a
 * lone 1 is how a 3½-digit meter shows over range, and a winding below 1 Ω is more often a
 * prefix slip (m for M) than a real winding (common practice, no published source).
 */
export function entryQuestion(entered: string, quantity: Quantity): EntryQuestion | null {
  const text = normalise(entered);
  if (/^1\.?$/.test(text)) {
    return {
      kind: 'lone_one',
      question: 'Over range? Many meters show a lone 1 at the left for over range (OL). Is the meter showing over range, or really 1?',
    };
  }
  const parsed = parseEntry(entered, quantity);
  if (quantity === 'resistance' && parsed.ok && parsed.kind === 'value' && parsed.value < 1) {
    return {
      kind: 'below_one_ohm',
      question: `${text} is below 1 Ω, far under any winding. Check the prefix: m is milli, M is mega. Is this what the meter shows?`,
    };
  }
  return null;
}
