import fc from 'fast-check';
import { FC_SEED } from './testing/fast-check-seed';
import type { WindingBand } from '../schemas/band-set';
import { judgeRatio, judgeResistance, judgeVoltage, VERDICT_SEVERITY } from './judge-band';
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
      ), { seed: FC_SEED },
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

describe('judgeResistance — thresholds, directions and the figures in the reason', () => {
  // Band made up for these tests (nominal 100 Ω, ±5 % in band, ±10 % near edge, short ≤ 10 Ω, open ≥ 1 kΩ); percentages worked by hand.
  it('OL is open, high, with no percentage', () => {
    expect(judgeResistance('over_range', band)).toEqual({ verdict: 'open', direction: 'high', deviationPercent: null, reason: expect.stringMatching(/OL.*open/) });
  });

  it('at the open threshold: open, high, naming the reading and the threshold', () => {
    const result = judgeResistance(1000, band);
    expect(result).toMatchObject({ verdict: 'open', direction: 'high', deviationPercent: null });
    expect(result.reason).toBe('1 kΩ is at or above the open threshold of 1 kΩ.');
    expect(judgeResistance(999, band).verdict).toBe('out_of_band');
  });

  it('at the short threshold: short, low, naming the reading and the threshold', () => {
    const result = judgeResistance(10, band);
    expect(result).toMatchObject({ verdict: 'short', direction: 'low', deviationPercent: null });
    expect(result.reason).toBe('10 Ω is at or below the short threshold of 10 Ω.');
    expect(judgeResistance(10.5, band)).toMatchObject({ verdict: 'out_of_band', direction: 'low' });
  });

  it('in band: no direction, the signed deviation, and the ±5 % named', () => {
    const result = judgeResistance(103, band);
    expect(result).toMatchObject({ verdict: 'in_band', direction: null });
    expect(result.deviationPercent).toBeCloseTo(3, 10);
    expect(result.reason).toBe('103 Ω is 3.0 % above nominal 100 Ω, within ±5 %.');
  });

  it('exactly on the near-edge limit (110 Ω, +10 %) is still near the edge, high', () => {
    const result = judgeResistance(110, band);
    expect(result).toMatchObject({ verdict: 'near_edge', direction: 'high' });
    expect(result.reason).toContain('10.0 % above nominal 100 Ω');
  });

  it('out of band below: low, −20 %, beyond the near-edge ±10 %', () => {
    const result = judgeResistance(80, band);
    expect(result).toMatchObject({ verdict: 'out_of_band', direction: 'low' });
    expect(result.deviationPercent).toBeCloseTo(-20, 10);
    expect(result.reason).toBe('80 Ω is 20.0 % below nominal 100 Ω, beyond the near-edge ±10 %.');
  });

  it('out of band above: high, +11 %', () => {
    const result = judgeResistance(111, band);
    expect(result).toMatchObject({ verdict: 'out_of_band', direction: 'high' });
    expect(result.deviationPercent).toBeCloseTo(11, 10);
    expect(result.reason).toContain('11.0 % above nominal 100 Ω');
  });
});

describe('judgeVoltage — deviation from the nearest edge, and the reason', () => {
  // Common practice, no published source: excitation about 4 to 4.5 V AC (near-edge 5 % is the tests' own choice).
  const range = OLDER_GENERATION.excitation;

  it('in band: deviation 0, no direction, the range named', () => {
    expect(judgeVoltage(4.25, range)).toEqual({ verdict: 'in_band', direction: null, deviationPercent: 0, reason: '4.25 V is within 4 V to 4.5 V.' });
  });

  it('3.9 V is 2.5 % below the 4 V edge: near edge, low', () => {
    const result = judgeVoltage(3.9, range);
    expect(result.deviationPercent).toBeCloseTo(-2.5, 10);
    expect(result.reason).toBe('3.9 V is 2.5 % below the range 4 V to 4.5 V, within the near-edge margin of 5 %.');
  });

  it('4.7 V is 4.44 % above the 4.5 V edge (0.2 / 4.5): near edge, high', () => {
    const result = judgeVoltage(4.7, range);
    expect(result.deviationPercent).toBeCloseTo((0.2 / 4.5) * 100, 10);
    expect(result.reason).toContain('4.4 % above the range');
  });

  it('exactly 5 % outside either edge is still near the edge: 3.8 V and 4.725 V', () => {
    expect(judgeVoltage(3.8, range)).toMatchObject({ verdict: 'near_edge', direction: 'low' });
    expect(judgeVoltage(4.725, range)).toMatchObject({ verdict: 'near_edge', direction: 'high' });
  });

  it('3.2 V is 20 % below: out of band, low; 6 V is 33.3 % above: out of band, high', () => {
    const low = judgeVoltage(3.2, range);
    expect(low.deviationPercent).toBeCloseTo(-20, 10);
    expect(low.reason).toBe('3.2 V is 20.0 % below the range 4 V to 4.5 V, beyond the near-edge margin of 5 %.');
    const high = judgeVoltage(6, range);
    expect(high.deviationPercent).toBeCloseTo((1.5 / 4.5) * 100, 10);
    expect(high.reason).toContain('33.3 % above the range');
  });

  it('OL on a voltage says so, names the expected range and has no percentage (not NaN)', () => {
    const result = judgeVoltage('over_range', range);
    expect(result.deviationPercent).toBeNull();
    expect(result.reason).toContain('OL');
    expect(result.reason).toContain('AC volts');
    expect(result.reason).toContain('expected 4 V to 4.5 V');
  });
});

describe('judgeRatio — transformation ratio against its band', () => {
  // Resolver references call a ratio near 0.5 common; the band here is the tests' own choice. Figures computed by hand.
  const band = { min: 0.45, max: 0.6, nearEdgePercent: 5 };

  it('inside the band: in band, no direction, naming the ratio and the band', () => {
    const j = judgeRatio(0.51, band);
    expect(j).toMatchObject({ verdict: 'in_band', direction: null, deviationPercent: 0 });
    expect(j.reason).toContain('0.510');
    expect(j.reason).toContain('0.450 to 0.600');
  });

  it('exactly on either limit is in band', () => {
    expect(judgeRatio(0.45, band).verdict).toBe('in_band');
    expect(judgeRatio(0.6, band).verdict).toBe('in_band');
  });

  it('above the band: 0.66 is 10 % above 0.6, out of band high; 0.615 is 2.5 % above, near the edge', () => {
    const out = judgeRatio(0.66, band);
    expect(out).toMatchObject({ verdict: 'out_of_band', direction: 'high' });
    expect(out.deviationPercent).toBeCloseTo(10, 9);
    expect(out.reason).toMatch(/0\.660 is 10(\.0)? % above .*beyond/);
    const near = judgeRatio(0.615, band);
    expect(near).toMatchObject({ verdict: 'near_edge', direction: 'high' });
    expect(near.deviationPercent).toBeCloseTo(2.5, 9);
    expect(near.reason).toMatch(/above .*within/);
  });

  it('below the band: 0.44 is 2.2 % below 0.45, near the edge, low', () => {
    const j = judgeRatio(0.44, band);
    expect(j).toMatchObject({ verdict: 'near_edge', direction: 'low' });
    expect(j.deviationPercent).toBeCloseTo(-2.222, 3);
    expect(j.reason).toContain('below');
  });

  it('a deviation exactly at the near-edge margin is still near the edge: 0.55 is 10 % above 0.5 with a 10 % margin', () => {
    expect(judgeRatio(0.55, { min: 0.4, max: 0.5, nearEdgePercent: 10 }).verdict).toBe('near_edge');
  });
});
