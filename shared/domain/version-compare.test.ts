import { compareVersions } from 'compare-versions';
import fc from 'fast-check';
import { FC_SEED } from './testing/fast-check-seed';
import semver from 'semver';
import { compareDottedVersions, parseDottedVersion, versionInRange } from './version-compare';

const dotted = fc
  .array(fc.integer({ min: 0, max: 120 }), { minLength: 1, maxLength: 3 })
  .map((parts) => parts.join('.'));

describe('compareDottedVersions', () => {
  it('orders 2.10 after 2.9 (fields compared as numbers, not text)', () => {
    expect(compareDottedVersions('2.10', '2.9')).toBe(1);
    expect(compareDottedVersions('2.9', '2.10')).toBe(-1);
  });

  it('treats missing fields as zero: 2.1 equals 2.1.0', () => {
    expect(compareDottedVersions('2.1', '2.1.0')).toBe(0);
  });

  it('agrees with the compare-versions library on any versions of up to three fields (property)', () => {
    fc.assert(
      fc.property(dotted, dotted, (a, b) => {
        expect(compareDottedVersions(a, b)).toBe(compareVersions(a, b));
      }), { seed: FC_SEED },
    );
  });

  it('agrees with semver after coercion on any versions of up to three fields (property)', () => {
    fc.assert(
      fc.property(dotted, dotted, (a, b) => {
        // semver.valid('3.2') is null, so coerce first (per REFERENCES note).
        expect(compareDottedVersions(a, b)).toBe(semver.compare(semver.coerce(a)!, semver.coerce(b)!));
      }), { seed: FC_SEED },
    );
  });

  it('accepts a leading v and refuses text that is not a dotted version', () => {
    expect(parseDottedVersion('v4.2')).toEqual([4, 2]);
    expect(parseDottedVersion('4.2b')).toBeNull();
    expect(parseDottedVersion('4..2')).toBeNull();
    expect(() => compareDottedVersions('4.x', '4.1')).toThrow(RangeError);
  });
});

describe('versionInRange', () => {
  it('includes from and excludes before', () => {
    expect(versionInRange('4.0', { from: '4.0', before: '4.3' })).toBe(true);
    expect(versionInRange('4.2.9', { from: '4.0', before: '4.3' })).toBe(true);
    expect(versionInRange('4.3', { from: '4.0', before: '4.3' })).toBe(false);
    expect(versionInRange('3.99', { from: '4.0' })).toBe(false);
    expect(versionInRange('0.1', {})).toBe(true);
  });
});

describe('dotted versions — more cases', () => {
  it('orders by the first differing field either way, and equal versions compare 0', () => {
    expect(compareDottedVersions('4.2', '4.10')).toBe(-1);
    expect(compareDottedVersions('4.10', '4.2')).toBe(1);
    expect(compareDottedVersions('4.2.0.0', '4.2')).toBe(0);
    expect(compareDottedVersions('4.2.1', '4.2')).toBe(1);
    expect(compareDottedVersions('4.2', '4.2.1')).toBe(-1);
  });

  it('names the version that is not dotted, whichever side it is on', () => {
    expect(() => compareDottedVersions('4.x', '4.1')).toThrow('Not a dotted version: "4.x".');
    expect(() => compareDottedVersions('4.1', 'beta')).toThrow('Not a dotted version: "beta".');
  });

  it('trims spaces, accepts V as well as v, and refuses text around the version', () => {
    expect(parseDottedVersion(' V4.2 ')).toEqual([4, 2]);
    expect(parseDottedVersion('x4.2')).toBeNull();
    expect(parseDottedVersion('4.2x')).toBeNull();
    expect(parseDottedVersion('.4')).toBeNull();
  });

  it('a range with only before, or only from, works on its own', () => {
    expect(versionInRange('1.9', { before: '2.0' })).toBe(true);
    expect(versionInRange('2.0', { before: '2.0' })).toBe(false);
    expect(versionInRange('4.0', { from: '4.0' })).toBe(true);
  });
});

describe('parseDottedVersion — the v prefix', () => {
  it('drops a leading v only: "v4.2" is 4.2, but "4.2v" and "4v2" are not versions', () => {
    expect(parseDottedVersion('v4.2')).toEqual([4, 2]);
    expect(parseDottedVersion('4.2v')).toBeNull();
    expect(parseDottedVersion('4v2')).toBeNull();
  });
});
