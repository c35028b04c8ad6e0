/**
 * What a technician may record as a firmware version read from a unit's display: a dotted version,
 * or the explicit choice that it cannot be read. Anything else is refused, so a signed record
 * never carries free text where a version belongs.
 */

/** The recorded answer when the display cannot be read (blank, damaged, no diagnostic screen). */
export const FIRMWARE_UNREADABLE = 'unreadable';
export const FIRMWARE_UNREADABLE_LABEL = 'Cannot read the version';

export const FIRMWARE_VERSION_MAX_LENGTH = 40;

/**
 * Up to three letters (a "v" or a unit's own prefix), one to six numeric fields of up to six
 * digits joined by dots, and an optional suffix of a letter or a hyphen and letter followed by up
 * to eleven letters or digits: 2.14, v3.1.0, 2.14b, 2.0.7-rc1. Versions with a prefix other than
 * "v" or with a suffix are recorded but not compared by the rules (the engine answers "unknown").
 */
export const FIRMWARE_VERSION_PATTERN = /^[A-Za-z]{0,3}\d{1,6}(?:\.\d{1,6}){0,5}(?:-?[A-Za-z][A-Za-z0-9]{0,11})?$/;

export function isFirmwareVersionAnswer(value: string): boolean {
  return value === FIRMWARE_UNREADABLE || (value.length <= FIRMWARE_VERSION_MAX_LENGTH && FIRMWARE_VERSION_PATTERN.test(value));
}

export const FIRMWARE_VERSION_HINT = `Type the version as displayed, such as 2.14 or v3.1.0, or choose "${FIRMWARE_UNREADABLE_LABEL}".`;

/** How a recorded version reads on screens and the report. */
export function firmwareVersionText(value: string | null | undefined): string | null {
  if (value === undefined || value === null) return null;
  return value === FIRMWARE_UNREADABLE ? FIRMWARE_UNREADABLE_LABEL : value;
}
