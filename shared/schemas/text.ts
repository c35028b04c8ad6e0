import { z } from 'zod';

// The one string type for anything a person types. PostgreSQL cannot store a NUL character or a
// lone UTF-16 surrogate in JSONB (it refuses the whole write) and changes them silently in TEXT, so
// they are refused here, at the edge, with a message naming the field. Other control characters
// are junk from copy and paste (or a forged line in a plain-text e-mail); direction overrides
// (U+202A–U+202E, U+2066–U+2069) make a line read in a different order than it was typed.
// Right-to-left script itself needs none of them: the Unicode bidirectional algorithm orders it.

const DIRECTION_OVERRIDE = /[\u202A-\u202E\u2066-\u2069]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** The first C0 or C1 control character (tab, CR and LF count only in a single-line text). */
function firstControl(value: string, singleLine: boolean): string | null {
  for (const ch of value) {
    const code = ch.codePointAt(0)!;
    if (code >= 0x20 && (code < 0x7f || code > 0x9f)) continue;
    if (!singleLine && (code === 0x09 || code === 0x0a || code === 0x0d)) continue;
    return ch;
  }
  return null;
}

const hex = (ch: string) => `U+${ch.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}`;

/** Why PostgreSQL cannot store a string (a NUL or a lone surrogate), in words that say what to do. */
export function storageProblem(value: string): string | null {
  if (value.includes('\u0000')) return 'Remove the NUL character (U+0000): it cannot be stored. Retype the text if it was pasted.';
  if (LONE_SURROGATE.test(value)) return 'This text holds a broken character (half of a Unicode pair). Retype it, or paste it again from its source.';
  return null;
}

/** Why a string cannot be taken as typed, in words that say what to do; null when it is fine. */
export function unstorableText(value: string, { singleLine = false } = {}): string | null {
  const stored = storageProblem(value);
  if (stored) return stored;
  const control = firstControl(value, singleLine);
  if (control === '\t' || control === '\n' || control === '\r') return 'A name fits on one line: remove the line break or tab.';
  if (control) return `Remove the control character (${hex(control)}); it is invisible and cannot be printed. Retype the text if it was pasted.`;
  const direction = DIRECTION_OVERRIDE.exec(value);
  if (direction) return `Remove the direction control character (${hex(direction[0])}): it makes the text read in a different order than it was typed.`;
  return null;
}

interface TextOptions {
  max: number;
  /** Shortest accepted length after trimming; 0 accepts an empty string. */
  min?: number;
  minMessage?: string;
  maxMessage?: string;
  /** Keep the text as sent (passwords, signatures); otherwise leading and trailing space is dropped. */
  trim?: boolean;
}

function build({ max, min = 0, minMessage, maxMessage, trim = true }: TextOptions, singleLine: boolean) {
  let schema = z.string('Send this as text');
  if (trim) schema = schema.trim();
  if (min > 0) schema = schema.min(min, minMessage ?? (min === 1 ? 'This cannot be empty' : `Use at least ${min} characters`));
  return schema.max(max, maxMessage ?? `Use at most ${max} characters`).superRefine((value, ctx) => {
    const problem = unstorableText(value, { singleLine });
    if (problem) ctx.addIssue({ code: 'custom', message: problem });
  });
}

/** Free text (notes, remarks, descriptions): line breaks and tabs are fine. */
export const text = (options: TextOptions) => build(options, false);

/** A name or other one-line label: no line breaks, tabs or other control characters. */
export const nameText = (options: TextOptions) => build(options, true);
