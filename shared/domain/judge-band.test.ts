import fc from 'fast-check';
import type { WindingBand } from '../schemas/band-set';
import { judgeResistance, judgeVoltage, VERDICT_SEVERITY } from './judge-band';
import { NEWER_GENERATION, OLDER_GENERATION } from './testing/trade-fact-band-sets';

// A band made up for these tests only (not a check value): nominal 100 Ω, ±5 % / ±10 %.
const band: WindingBand = { nominal: 100, inBandPercent: 5, nearEdgePercent: 10, shortBelow: 10, openAbove: 1000 };

describe('judgeResistance', () => {
  it.each([
    [100, 'in_band'],
    [105, 'in_band'], // exactly on the in-band edge counts as inside
    [95, 'in_band'],
    [107, 'near_edge'],
    [90, 'near_edge'],
    [111, 'out_of_band'],
    [80, 'out_of_band'],
    [10, 'short'],
    [3, 'short'],
    [1000, 'open'],
    [5e6, 'open'],
  ] as const)('judges %f Ω against 100 Ω (in band ±5, near edge ±10 percent) as %s', (value, verdict) => {
    expect(judgeResistance(value, band).verdict).toBe(verdict);
  });

  it('judges OL as open with a reason', () => {
    expect(judgeResistance('over_range', band)).toMatchObject({ verdict: 'open', reason: expect.stringContaining('OL') });
  });

  it('says how far and which way a reading is off in its reason', () => {
    const result = judgeResistance(93, band);
    expect(result).toMatchObject({ verdict: 'near_edge', direction: 'low' });
    expect(result.deviationPercent).toBeCloseTo(-7, 10);
    expect(result.reason).toBe('93 Ω is 7.0 % below nominal 100 Ω: outside ±5 % but within the near-edge ±10 %.');
  });

  it('is monotonic: a larger deviation on either side never gives a milder verdict (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 85, noNaN: true }),
        fc.double({ min: 0, max: 85, noNaN: true }),
        fc.boolean(),
        (a, b, above) => {
          const [small, large] = a <= b ? [a, b] : [b, a];
          const at = (d: number) => judgeResistance(100 * (1 + (above ? d : -d) / 100), band).verdict;
          expect(VERDICT_SEVERITY[at(large)]).toBeGreaterThanOrEqual(VERDICT_SEVERITY[at(small)]);
        },
      ),
    );
  });

  // Common practice, no published source: older rotor about 89 Ω, newer rotor about 36 Ω.
  it('judges an 88 Ω rotor in band for the older generation and out of band for the newer one', () => {
    expect(judgeResistance(88, OLDER_GENERATION.windings.rotor).verdict).toBe('in_band');
    const newer = judgeResistance(88, NEWER_GENERATION.windings.rotor);
    expect(newer.verdict).toBe('out_of_band');
    expect(newer.direction).toBe('high');
  });

  // Common practice, no published source: older stators about 70 Ω, newer stators about 90 Ω.
  it('judges a 70 Ω stator in band for the older generation and out of band for the newer one', () => {
    expect(judgeResistance(70, OLDER_GENERATION.windings.stator_1).verdict).toBe('in_band');
    expect(judgeResistance(70, NEWER_GENERATION.windings.stator_1).verdict).toBe('out_of_band');
  });
});

describe('judgeVoltage', () => {
  // Common practice, no published source: excitation about 4 to 4.5 V AC.
  const range = OLDER_GENERATION.excitation;
  it.each([
    [4.25, 'in_band', null],
    [4.0, 'in_band', null],
    [4.5, 'in_band', null],
    [3.9, 'near_edge', 'low'],
    [4.7, 'near_edge', 'high'],
    [3.2, 'out_of_band', 'low'],
    [6.0, 'out_of_band', 'high'],
  ] as const)('judges %f V against 4.0–4.5 V as %s', (value, verdict, direction) => {
    expect(judgeVoltage(value, range)).toMatchObject({ verdict, direction });
  });

  it('treats OL on a voltage range as over range, not as an open circuit', () => {
    expect(judgeVoltage('over_range', range)).toMatchObject({ verdict: 'out_of_band', direction: 'high' });
  });
});
