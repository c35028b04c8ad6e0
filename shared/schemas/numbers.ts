import { z } from 'zod';

// Numbers arrive as JSON numbers (API) or as the text of a form field, a select or an address.
// Either form is accepted, but only when it is plainly a number: `true`, `null`, "" and text such as
// "1e3", "0x10" or "1.0" for an id are refused, where z.coerce would have turned them into 1, 0,
// 1000 or 16 without a word.

/** The largest value of a PostgreSQL integer column (and of every id we hand out). */
export const MAX_INT4 = 2_147_483_647;

const ID_TEXT = /^[1-9][0-9]*$/;
const WHOLE_TEXT = /^\s*-?[0-9]+\s*$/;
const DECIMAL_TEXT = /^\s*-?[0-9]+(\.[0-9]+)?\s*$/;

// Each branch carries the message too: a form resolver shows the first branch's issue of a union.
function numberFrom(pattern: RegExp, message: string) {
  return z.union([z.number(message), z.string(message).regex(pattern, message).transform(Number)], { error: message });
}

/** A row id: a whole number from 1 to 2,147,483,647, written only with digits in an address. */
export function idNumber(message = 'This id is a whole number from 1 up, written with digits only') {
  return numberFrom(ID_TEXT, message).pipe(z.number().int(message).min(1, message).max(MAX_INT4, message));
}

interface RangeOptions {
  min: number;
  max: number;
  /** Said when the value is not a number at all (empty, true, null, words). */
  message: string;
  minMessage?: string;
  maxMessage?: string;
}

/** A whole number within a range: minutes, quantities, tonnage, page numbers. */
export function wholeNumber({ min, max, message, minMessage, maxMessage }: RangeOptions) {
  return numberFrom(WHOLE_TEXT, message).pipe(
    z
      .number()
      .int(message)
      .min(min, minMessage ?? `Use ${min} or more`)
      .max(max, maxMessage ?? `Use ${max} or less`),
  );
}

/** A decimal number (no exponent, no hexadecimal) within a range. */
export function decimalNumber({ min, max, message, minMessage, maxMessage }: RangeOptions) {
  return numberFrom(DECIMAL_TEXT, message).pipe(
    z
      .number(message)
      .min(min, minMessage ?? `Use ${min} or more`)
      .max(max, maxMessage ?? `Use ${max} or less`),
  );
}
