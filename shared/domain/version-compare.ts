import type { VersionRange } from '../schemas/firmware-rule';

const DOTTED = /^\d+(\.\d+)*$/;

/** Splits a dotted numeric version into numbers; null when it is not one (e.g. "4.2b"). */
export function parseDottedVersion(version: string): number[] | null {
  const trimmed = version.trim().replace(/^v/i, '');
  if (!DOTTED.test(trimmed)) return null;
  return trimmed.split('.').map(Number);
}

/**
 * Compares dotted versions field by field as numbers (2.10 is after 2.9); missing fields count
 * as 0, so 2.1 equals 2.1.0. Returns −1, 0 or 1.
 */
export function compareDottedVersions(a: string, b: string): -1 | 0 | 1 {
  const left = parseDottedVersion(a);
  const right = parseDottedVersion(b);
  if (!left || !right) throw new RangeError(`Not a dotted version: "${left ? b : a}".`);
  for (let i = 0; i < Math.max(left.length, right.length); i += 1) {
    const x = left[i] ?? 0;
    const y = right[i] ?? 0;
    if (x !== y) return x < y ? -1 : 1;
  }
  return 0;
}

/** Whether a version lies in a half-open range [from, before). */
export function versionInRange(version: string, range: VersionRange): boolean {
  if (range.from !== undefined && compareDottedVersions(version, range.from) < 0) return false;
  if (range.before !== undefined && compareDottedVersions(version, range.before) >= 0) return false;
  return true;
}
