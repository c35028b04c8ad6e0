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
