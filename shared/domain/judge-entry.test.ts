import type { ReadingInput } from '../schemas/reading';
import { judgeEntry, type EntryJudgement } from './judge-entry';
import { OLDER_GENERATION } from './testing/trade-fact-band-sets';

// Band values from the trade (common practice, no published source): older generation rotor about
// 89 Ω, stators about 70 Ω, excitation about 4–4.5 V AC, stator outputs together 2–2.5 V AC.
const rotor = (entered: string, extra: Partial<ReadingInput> = {}): ReadingInput => ({
  quantity: 'resistance',
  circuit: 'rotor',
  position: 'control_end',
  entered,
  ...extra,
});

const judged = (j: EntryJudgement) => {
  if (j.status !== 'judged') throw new Error(`expected a verdict, got ${JSON.stringify(j)}`);
  return j;
};

describe('judgeEntry (resistance)', () => {
  it('judges a typed rotor reading end to end with its reason', () => {
    const result = judged(judgeEntry(rotor('88.0 Ω'), OLDER_GENERATION));
    expect(result.verdict).toBe('in_band');
    expect(result.reason).toContain('below nominal 89 Ω');
  });

  it('returns the field error for an unreadable entry', () => {
    expect(judgeEntry(rotor('4.2 V'), OLDER_GENERATION)).toEqual({ status: 'error', error: expect.stringContaining('voltage') });
  });

  it('judges OL as open', () => {
    expect(judged(judgeEntry(rotor('OL'), OLDER_GENERATION)).verdict).toBe('open');
  });

  it('subtracts the cable loop (50 ft of 24 AWG = 2.567 Ω at 20 °C, REFERENCES) from a control-end reading', () => {
    const result = judged(
      judgeEntry(rotor('91.6', { cable: { awg: 24, length: 50, lengthUnit: 'ft', lengthIs: 'one_way' } }), OLDER_GENERATION),
    );
    if (result.figures.kind !== 'resistance') throw new Error('resistance figures expected');
    expect(result.figures.cable!.resistance).toBeCloseTo(2.567, 3);
    expect(result.figures.winding).toBeCloseTo(91.6 - 2.567, 3);
    expect(result.figures.atReference).toBeCloseTo(89.033, 3);
  });

  it('does not subtract the cable from a reading taken at the sensor end', () => {
    const result = judged(
      judgeEntry(
        rotor('89', { position: 'sensor_end', cable: { awg: 24, length: 50, lengthUnit: 'ft', lengthIs: 'one_way' } }),
        OLDER_GENERATION,
      ),
    );
    if (result.figures.kind !== 'resistance') throw new Error('resistance figures expected');
    expect(result.figures.cable).toBeNull();
    expect(result.notes.join(' ')).toContain('sensor end');
  });

  it('corrects a warm winding to the reference temperature with the 234.5 constant (52.0 Ω at 32 °C → 49.66 Ω at 20 °C)', () => {
    const result = judged(judgeEntry({ ...rotor('52.0'), circuit: 'stator_1', windingTemperatureC: 32 }, OLDER_GENERATION));
    if (result.figures.kind !== 'resistance') throw new Error('resistance figures expected');
    expect(result.figures.atReference).toBeCloseTo(49.66, 2);
  });

  it('subtracts the cable at its temperature, then corrects the winding (24 AWG 50 ft at 40 °C = 2.769 Ω)', () => {
    const result = judged(
      judgeEntry(rotor('99.0', { windingTemperatureC: 40, cable: { awg: 24, length: 50, lengthUnit: 'ft', lengthIs: 'one_way' } }), OLDER_GENERATION),
    );
    if (result.figures.kind !== 'resistance') throw new Error('resistance figures expected');
    expect(result.figures.cable!.resistance).toBeCloseTo(2.769, 3);
    expect(result.figures.atReference).toBeCloseTo(((99 - 2.7685) * 254.5) / 274.5, 3);
  });

  it('calls a reading no larger than the cable itself a short, naming both figures', () => {
    const result = judged(
      judgeEntry(rotor('2.0', { cable: { awg: 24, length: 50, lengthUnit: 'ft', lengthIs: 'one_way' } }), OLDER_GENERATION),
    );
    expect(result.verdict).toBe('short');
    expect(result.reason).toContain('cable');
  });

  it('notes that no temperature correction was made when no temperature is given', () => {
    expect(judged(judgeEntry(rotor('89'), OLDER_GENERATION)).notes.join(' ')).toContain('without correction');
  });
});

describe('judgeEntry (AC voltage)', () => {
  const volts = (circuit: ReadingInput['circuit'], entered: string): ReadingInput => ({
    quantity: 'ac_voltage',
    circuit,
    position: 'control_end',
    entered,
  });

  it('judges 4.2 V excitation across the rotor in band (trade: about 4 to 4.5 V AC)', () => {
    expect(judged(judgeEntry(volts('rotor', '4.2 V'), OLDER_GENERATION)).verdict).toBe('in_band');
  });

  it('waits for the other stator before judging a stator output', () => {
    expect(judgeEntry(volts('stator_1', '1.2'), OLDER_GENERATION).status).toBe('awaiting');
  });

  it('judges the stator pair by vector magnitude: 1.2 V and 1.8 V make 2.163 V, in band (trade: 2 to 2.5 V)', () => {
    const result = judged(judgeEntry(volts('stator_1', '1.2'), OLDER_GENERATION, { otherStatorEntered: '1800 mV', excitationEntered: '4.2' }));
    expect(result.verdict).toBe('in_band');
    if (result.figures.kind !== 'ac_voltage') throw new Error('voltage figures expected');
    expect(result.figures.judged).toBeCloseTo(Math.hypot(1.2, 1.8), 12);
    expect(result.figures.output!.transformationRatio).toBeCloseTo(Math.hypot(1.2, 1.8) / 4.2, 12);
    expect(result.figures.output!.firstQuadrantAngle).toBeCloseTo((Math.atan2(1.2, 1.8) * 180) / Math.PI, 9);
  });

  it('judges the same pair the same from either stator', () => {
    const a = judged(judgeEntry(volts('stator_1', '0.9'), OLDER_GENERATION, { otherStatorEntered: '1.1' }));
    const b = judged(judgeEntry(volts('stator_2', '1.1'), OLDER_GENERATION, { otherStatorEntered: '0.9' }));
    expect([a.verdict, a.direction]).toEqual(['out_of_band', 'low']);
    expect(b.verdict).toBe(a.verdict);
    expect(b.figures).toMatchObject({ judged: a.figures.kind === 'ac_voltage' ? a.figures.judged : NaN });
  });
});

const CABLE_24_AWG_50_FT = { awg: 24, length: 50, lengthUnit: 'ft', lengthIs: 'one_way' } as const;
const resistanceFigures = (j: EntryJudgement) => {
  const r = judged(j);
  if (r.figures.kind !== 'resistance') throw new Error('resistance figures expected');
  return r.figures;
};
const voltageFigures = (j: EntryJudgement) => {
  const r = judged(j);
  if (r.figures.kind !== 'ac_voltage') throw new Error('voltage figures expected');
  return r.figures;
};

describe('judgeEntry (resistance) — figures and notes that go into the report', () => {
  it('OL: open, high, every figure null except the band facts, no notes', () => {
    const result = judged(judgeEntry(rotor('OL', { windingTemperatureC: 30 }), OLDER_GENERATION));
    expect(result).toMatchObject({ verdict: 'open', direction: 'high', deviationPercent: null, notes: [] });
    expect(result.figures).toEqual({ kind: 'resistance', measured: null, cable: null, winding: null, measuredAtC: 30, referenceTemperatureC: 20, atReference: null, nominal: 89 });
  });

  it('without cable or temperature: measured = winding = judged value, measuredAtC null, one note naming the 20 °C not corrected to', () => {
    const result = judged(judgeEntry(rotor('88'), OLDER_GENERATION));
    expect(result.figures).toEqual({ kind: 'resistance', measured: 88, cable: null, winding: 88, measuredAtC: null, referenceTemperatureC: 20, atReference: 88, nominal: 89 });
    expect(result.notes).toEqual([expect.stringMatching(/No winding temperature.*without correction to 20 °C/)]);
    expect(result.deviationPercent).toBeCloseTo(((88 - 89) / 89) * 100, 10);
  });

  it('the cable note names the loop (2 × 50 ft = 100 ft) and the 2.567 Ω subtracted (REFERENCES, computed)', () => {
    const result = judged(judgeEntry(rotor('91.6', { cable: CABLE_24_AWG_50_FT }), OLDER_GENERATION));
    expect(result.notes[0]).toMatch(/100 ft.*2\.567 Ω.*subtracted/);
  });

  it('with no winding temperature the cable is taken at the band\'s reference temperature: 25 °C → 2.567 × 259.5 / 254.5 = 2.6174 Ω (computed, 234.5 constant)', () => {
    const at25 = { ...OLDER_GENERATION, referenceTemperatureC: 25 };
    const figures = resistanceFigures(judgeEntry(rotor('91.6', { cable: CABLE_24_AWG_50_FT }), at25));
    expect(figures.cable!.temperatureC).toBe(25);
    expect(figures.cable!.resistance).toBeCloseTo(2.6174, 3);
  });

  it('a sensor-end reading with a cable keeps the cable out; a control-end reading without one subtracts nothing', () => {
    const sensorEnd = judged(judgeEntry(rotor('89', { position: 'sensor_end', cable: CABLE_24_AWG_50_FT }), OLDER_GENERATION));
    expect(sensorEnd.notes[0]).toContain('no allowance is subtracted');
    expect(resistanceFigures(sensorEnd).winding).toBe(89);
    const noCable = judged(judgeEntry(rotor('89'), OLDER_GENERATION));
    expect(noCable.notes.some((n) => n.includes('allowance') || n.includes('Cable'))).toBe(false);
  });

  it('a reading below the cable\'s own 2.567 Ω is a short, low, naming both figures', () => {
    const result = judged(judgeEntry(rotor('2.0', { cable: CABLE_24_AWG_50_FT }), OLDER_GENERATION));
    expect(result).toMatchObject({ verdict: 'short', direction: 'low', deviationPercent: null });
    expect(result.reason).toMatch(/^2 Ω is no more than the cable's own 2\.567 Ω/);
    expect(resistanceFigures(judgeEntry(rotor('2.0', { cable: CABLE_24_AWG_50_FT }), OLDER_GENERATION)).winding).toBeCloseTo(2 - 2.567, 3);
  });

  it('a reading of 0 Ω with no cable is a short too', () => {
    const result = judged(judgeEntry(rotor('0'), OLDER_GENERATION));
    expect(result).toMatchObject({ verdict: 'short', direction: 'low' });
    expect(result.reason).toContain('0 Ω');
  });

  it('the correction note names both temperatures and the corrected value: 52.0 Ω at 32 °C → 49.66 Ω at 20 °C (REFERENCES, computed)', () => {
    const result = judged(judgeEntry({ ...rotor('52.0'), circuit: 'stator_1', windingTemperatureC: 32 }, OLDER_GENERATION));
    expect(result.notes).toEqual(['Corrected from 32 °C to 20 °C: 49.66 Ω.']);
    expect(resistanceFigures(judgeEntry({ ...rotor('52.0'), circuit: 'stator_1', windingTemperatureC: 32 }, OLDER_GENERATION)).measuredAtC).toBe(32);
  });

  it('a winding measured at the reference temperature gets no correction note', () => {
    expect(judged(judgeEntry(rotor('89', { windingTemperatureC: 20 }), OLDER_GENERATION)).notes).toEqual([]);
  });
});

describe('judgeEntry (AC voltage) — partners, OL and the resolver figures', () => {
  const volts = (circuit: ReadingInput['circuit'], entered: string): ReadingInput => ({ quantity: 'ac_voltage', circuit, position: 'control_end', entered });

  it('excitation: measured = judged, the R1–R2 note, no resolver output', () => {
    const result = judged(judgeEntry(volts('rotor', '4.2 V'), OLDER_GENERATION));
    expect(result.figures).toEqual({ kind: 'ac_voltage', measured: 4.2, judged: 4.2, output: null, range: OLDER_GENERATION.excitation });
    expect(result.notes).toEqual([expect.stringContaining('R1–R2')]);
  });

  it('OL on the excitation: out of band, high, no figures', () => {
    const result = judged(judgeEntry(volts('rotor', 'OL'), OLDER_GENERATION));
    expect(result).toMatchObject({ verdict: 'out_of_band', direction: 'high', deviationPercent: null });
    expect(result.figures).toMatchObject({ measured: null, judged: null });
  });

  // "1,200" could be 1.2 or 1200 (a comma before exactly three digits may be a thousands separator): refused.
  it('an unreadable own entry is a field error', () => {
    expect(judgeEntry(volts('stator_1', '1,200'), OLDER_GENERATION)).toEqual({ status: 'error', error: expect.stringContaining('point for decimals') });
  });

  it('a blank partner waits, saying both outputs are needed for the vector magnitude', () => {
    const result = judgeEntry(volts('stator_1', '1.2'), OLDER_GENERATION, { otherStatorEntered: '   ' });
    expect(result).toEqual({ status: 'awaiting', reason: expect.stringContaining('both stator outputs') });
  });

  it('a partner that cannot be parsed waits too (no NaN verdict), passing on the partner\'s error', () => {
    const result = judgeEntry(volts('stator_1', '1.2'), OLDER_GENERATION, { otherStatorEntered: '1,800' });
    expect(result).toEqual({ status: 'awaiting', reason: expect.stringMatching(/other stator output cannot be read yet: .*point for decimals/) });
  });

  it('OL on this stator: out of band, high, no percentage, no judged value', () => {
    const result = judged(judgeEntry(volts('stator_1', 'OL'), OLDER_GENERATION, { otherStatorEntered: '1.2' }));
    expect(result).toMatchObject({ verdict: 'out_of_band', direction: 'high', deviationPercent: null, notes: [] });
    expect(result.figures).toEqual({ kind: 'ac_voltage', measured: null, judged: null, output: null, range: OLDER_GENERATION.statorOutputMagnitude });
    expect(result.reason).toContain('OL');
  });

  it('OL on the partner: the own value is still shown as measured', () => {
    const result = judged(judgeEntry(volts('stator_1', '1.2'), OLDER_GENERATION, { otherStatorEntered: 'OL' }));
    expect(result).toMatchObject({ verdict: 'out_of_band', direction: 'high', deviationPercent: null });
    expect(result.figures).toMatchObject({ measured: 1.2, judged: null, output: null });
  });

  // Resolver theory (REFERENCES, worked): E = 7.0 V, K = 0.5, θ = 30° → S1 1.750 V, S2 3.031 V, magnitude 3.5 V.
  it('E = 7.0 V, θ = 30°: S1 1.750 V and S2 3.031 V give 3.5 V, ratio 0.500, angle 30.0°, 40 % above 2–2.5 V (REFERENCES, worked)', () => {
    const result = judged(judgeEntry(volts('stator_1', '1.750'), OLDER_GENERATION, { otherStatorEntered: '3.031', excitationEntered: '7.0' }));
    expect(result).toMatchObject({ verdict: 'out_of_band', direction: 'high' });
    const figures = voltageFigures(judgeEntry(volts('stator_1', '1.750'), OLDER_GENERATION, { otherStatorEntered: '3.031', excitationEntered: '7.0' }));
    expect(figures.measured).toBe(1.75);
    expect(figures.judged).toBeCloseTo(3.5, 3);
    expect(figures.output!.transformationRatio).toBeCloseTo(0.5, 3);
    expect(figures.output!.firstQuadrantAngle).toBeCloseTo(30, 1);
    expect(result.deviationPercent).toBeCloseTo(((Math.hypot(1.75, 3.031) - 2.5) / 2.5) * 100, 9);
    expect(result.reason).toMatch(/^Stator pair: 3\.5 V is 40\.0 % above the range 2 V to 2\.5 V/);
    expect(result.notes).toEqual(['Stator pair magnitude √(V(S1–S3)² + V(S2–S4)²) = 3.5 V; angle 30.0° (first quadrant).', 'Transformation ratio 0.500 (this band set has no ratio band).']);
  });

  it('entered from the cosine stator (S2), the angle is still atan2(S1, S2): S2 3.031 V with S1 1.750 V → 30.0°', () => {
    const figures = voltageFigures(judgeEntry(volts('stator_2', '3.031'), OLDER_GENERATION, { otherStatorEntered: '1.750' }));
    expect(figures.measured).toBe(3.031);
    expect(figures.output!.firstQuadrantAngle).toBeCloseTo(30, 1);
    expect(figures.output!.transformationRatio).toBeNull();
  });

  it('without an excitation reading there is no ratio and no ratio note', () => {
    const result = judged(judgeEntry(volts('stator_1', '1.2'), OLDER_GENERATION, { otherStatorEntered: '1.8' }));
    expect(result.notes).toHaveLength(1);
    expect(result.notes[0]).toContain('2.163 V');
  });
});

describe('judgeEntry — the ratio band and a reading equal to nothing', () => {
  const RATIO_BAND = { ...OLDER_GENERATION, transformationRatio: { min: 0.45, max: 0.6, nearEdgePercent: 5 } };
  const volts = (circuit: ReadingInput['circuit'], entered: string): ReadingInput => ({ quantity: 'ac_voltage', circuit, position: 'control_end', entered });

  it('with a ratio band and the excitation, the ratio is judged and its reason is a note: 2.163 V / 4.2 V = 0.515 (computed)', () => {
    const result = judged(judgeEntry(volts('stator_1', '1.2'), RATIO_BAND, { otherStatorEntered: '1.8', excitationEntered: '4.2' }));
    expect(result.notes).toHaveLength(2);
    expect(result.notes[1]).toContain('Ratio 0.515 is within 0.450 to 0.600');
    if (result.figures.kind !== 'ac_voltage') throw new Error('voltage figures expected');
    expect(result.figures.ratio?.verdict).toBe('in_band');
  });

  it('with a ratio band but no excitation, there is no ratio to judge', () => {
    const result = judged(judgeEntry(volts('stator_1', '1.2'), RATIO_BAND, { otherStatorEntered: '1.8' }));
    if (result.figures.kind !== 'ac_voltage') throw new Error('voltage figures expected');
    expect(result.figures.ratio).toBeNull();
    expect(result.notes).toHaveLength(1);
  });

  it('0 Ω is a short before any temperature step: no corrected value and no correction note', () => {
    const result = judged(judgeEntry(rotor('0'), OLDER_GENERATION));
    expect(result.verdict).toBe('short');
    if (result.figures.kind !== 'resistance') throw new Error('resistance figures expected');
    expect(result.figures.atReference).toBeNull();
    expect(result.notes).toEqual([]);
  });
});
