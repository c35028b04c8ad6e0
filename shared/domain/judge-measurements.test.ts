import type { ReadingInput } from '../schemas/reading';
import { judgeMeasurements, outcomeForStep } from './judge-measurements';
import { OLDER_GENERATION } from './testing/trade-fact-band-sets';

// Bands from the trade (common practice, no published source): older generation rotor about 89 Ω,
// stators about 70 Ω; excitation about 4–4.5 V AC; stator outputs together 2–2.5 V AC.
const windings = (rotor: string, s1: string, s2: string, position: ReadingInput['position'] = 'control_end'): ReadingInput[] => [
  { quantity: 'resistance', circuit: 'rotor', position, entered: rotor },
  { quantity: 'resistance', circuit: 'stator_1', position, entered: s1 },
  { quantity: 'resistance', circuit: 'stator_2', position, entered: s2 },
];
const voltages = (excitation: string, s1: string, s2: string): ReadingInput[] => [
  { quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', entered: excitation },
  { quantity: 'ac_voltage', circuit: 'stator_1', position: 'control_end', entered: s1 },
  { quantity: 'ac_voltage', circuit: 'stator_2', position: 'control_end', entered: s2 },
];

describe('judgeMeasurements', () => {
  it('passes three windings that read right', () => {
    expect(judgeMeasurements(windings('89', '70', '70.5'), OLDER_GENERATION).outcome).toBe('pass');
  });

  it('gives high for an open winding and low for a short', () => {
    expect(judgeMeasurements(windings('OL', '70', '70'), OLDER_GENERATION).outcome).toBe('high');
    expect(judgeMeasurements(windings('89', '0.4', '70'), OLDER_GENERATION).outcome).toBe('low');
  });

  it('flags stators that are each in band but differ by more than the balance limit', () => {
    const result = judgeMeasurements(windings('89', '66', '74'), OLDER_GENERATION);
    expect(result.results.every((r) => r.judgement.status === 'judged' && r.judgement.verdict === 'in_band')).toBe(true);
    expect(result.outcome).toBe('imbalance');
    expect(result.balance?.balanced).toBe(false);
  });

  it('has no outcome while a reading is missing or unreadable', () => {
    expect(judgeMeasurements(windings('89', '', '70'), OLDER_GENERATION).outcome).toBeNull();
    expect(judgeMeasurements(windings('89', '7O', '70'), OLDER_GENERATION).outcome).toBeNull();
  });

  it('passes energized readings in range: 4.2 V excitation, stators 1.3 V and 1.7 V (magnitude 2.14 V)', () => {
    expect(judgeMeasurements(voltages('4.2', '1.3', '1.7'), OLDER_GENERATION).outcome).toBe('pass');
  });

  it('gives output_low when the stator pair is low with good excitation (the sensor or cable, not the drive)', () => {
    const result = judgeMeasurements(voltages('4.2', '0.8', '1.0'), OLDER_GENERATION);
    expect(result.outcome).toBe('output_low');
    expect(result.reason).toContain('Stator pair');
  });

  it('gives excitation_out_of_range when the drive is off, whatever the output reads', () => {
    expect(judgeMeasurements(voltages('2.9', '0.8', '1.0'), OLDER_GENERATION).outcome).toBe('excitation_out_of_range');
    expect(judgeMeasurements(voltages('5.5', '1.3', '1.7'), OLDER_GENERATION).outcome).toBe('excitation_out_of_range');
  });

  // Resolver theory: magnitude = ratio × excitation. Excitation 4.4 V in range, pair 1.2 V and 1.6 V
  // → magnitude √(1.44 + 2.56) = 2.0 V, in its range, but ratio 2.0 / 4.4 = 0.4545 under a 0.47 floor.
  it('gives output_low on a low ratio even when the magnitude alone passes', () => {
    const band = { ...OLDER_GENERATION, transformationRatio: { min: 0.47, max: 0.6, nearEdgePercent: 2 } };
    const result = judgeMeasurements(voltages('4.4', '1.2', '1.6'), band);
    expect(result.outcome).toBe('output_low');
    expect(result.reason).toMatch(/Ratio 0\.455 is 3\.3 % below/);
  });

  // A meter that rolls off at the excitation frequency reads every voltage low by one factor: here
  // 60 % of 4.2 / 1.3 / 1.7 V. Absolute volts then say "board"; the ratio (2.140 / 4.2 = 0.510) holds.
  it('judges by the ratio alone when the meter does not cover the excitation frequency', () => {
    const band = { ...OLDER_GENERATION, transformationRatio: { min: 0.45, max: 0.6, nearEdgePercent: 5 }, excitationFrequencyHz: 5000 };
    const rolledOff = voltages('2.52', '0.78', '1.02');
    expect(judgeMeasurements(rolledOff, band).outcome).toBe('excitation_out_of_range');
    const byRatio = judgeMeasurements(rolledOff, band, { ratioOnly: true });
    expect(byRatio.outcome).toBe('pass');
    expect(byRatio.reason).toContain('5000 Hz');
  });

  it('cannot judge by ratio alone without a ratio band, and says what to do', () => {
    const result = judgeMeasurements(voltages('4.2', '1.3', '1.7'), OLDER_GENERATION, { ratioOnly: true });
    expect(result.outcome).toBeNull();
    expect(result.reason).toContain('true-RMS');
  });

  it('maps the new outcomes onto procedures published with low / high only', () => {
    expect(outcomeForStep(judgeMeasurements(voltages('4.2', '0.8', '1.0'), OLDER_GENERATION), ['pass', 'low', 'high'])).toBe('low');
    expect(outcomeForStep(judgeMeasurements(voltages('5.5', '1.3', '1.7'), OLDER_GENERATION), ['pass', 'low', 'high'])).toBe('high');
    expect(outcomeForStep(judgeMeasurements(voltages('4.2', '0.8', '1.0'), OLDER_GENERATION), ['pass', 'excitation_out_of_range', 'output_low', 'output_high'])).toBe('output_low');
  });
});

describe('judgeMeasurements — outcome rules and the reasons shown', () => {
  it('a step with no readings has no outcome (it does not pass)', () => {
    const result = judgeMeasurements([], OLDER_GENERATION);
    expect(result.outcome).toBeNull();
    expect(result.reason).toContain('still missing');
  });

  it('near_edge passes but is named: rotor 100 Ω is 12.4 % above 89 Ω (near edge in the test bands)', () => {
    expect(judgeMeasurements(windings('100', '70', '70'), OLDER_GENERATION)).toMatchObject({
      outcome: 'pass',
      reason: 'All readings pass; rotor near the edge: note for the next visit.',
    });
    expect(judgeMeasurements(windings('100', '80', '80'), OLDER_GENERATION).reason).toContain('rotor, stator_1, stator_2 near the edge');
    expect(judgeMeasurements(windings('89', '70', '70'), OLDER_GENERATION).reason).toBe('All readings are in band.');
  });

  it('low wins over high when one reading fails each way, and the reason names each failing circuit with its figures', () => {
    const result = judgeMeasurements(windings('OL', '0.4', '70'), OLDER_GENERATION);
    expect(result.outcome).toBe('low');
    expect(result.reason).toMatch(/^rotor: .*OL.* stator_1: 400 mΩ is at or below the short threshold/);
  });

  it('high names the circuit and how far above: rotor 120 Ω is 34.8 % above 89 Ω', () => {
    const result = judgeMeasurements(windings('120', '70', '70'), OLDER_GENERATION);
    expect(result.outcome).toBe('high');
    expect(result.reason).toBe('rotor: 120 Ω is 34.8 % above nominal 89 Ω, beyond the near-edge ±20 %.');
  });

  it('imbalance gives the balance reason (66 Ω and 74 Ω: 11.4 % over the 5 % limit)', () => {
    const result = judgeMeasurements(windings('89', '66', '74'), OLDER_GENERATION);
    expect(result.reason).toContain('11.4 %');
    expect(result.balance?.imbalancePercent).toBeCloseTo((8 / 70) * 100, 10);
  });

  it('computes no balance for stators measured at different ends, or when one is OL', () => {
    const mixed: ReadingInput[] = [
      { quantity: 'resistance', circuit: 'stator_1', position: 'control_end', entered: '66' },
      { quantity: 'resistance', circuit: 'stator_2', position: 'sensor_end', entered: '74' },
    ];
    expect(judgeMeasurements(mixed, OLDER_GENERATION)).toMatchObject({ balance: null, outcome: 'pass' });
    expect(judgeMeasurements(windings('89', 'OL', '70'), OLDER_GENERATION).balance).toBeNull();
  });

  it('balances the windings at the reference temperature, after the cable', () => {
    const warm = windings('89', '70', '70').map((r) => ({ ...r, windingTemperatureC: 40 }));
    expect(judgeMeasurements(warm, OLDER_GENERATION).balance).toMatchObject({ imbalancePercent: 0, balanced: true });
  });

  it('pairs a stator output only with the other stator at the same position, and only with a voltage', () => {
    const readings: ReadingInput[] = [
      { quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', entered: '4.2' },
      { quantity: 'ac_voltage', circuit: 'stator_1', position: 'control_end', entered: '1.2' },
      { quantity: 'ac_voltage', circuit: 'stator_2', position: 'sensor_end', entered: '1.8' },
      { quantity: 'resistance', circuit: 'stator_2', position: 'control_end', entered: '70' },
    ];
    const result = judgeMeasurements(readings, OLDER_GENERATION);
    expect(result.results[1]!.judgement.status).toBe('awaiting');
    expect(result.outcome).toBeNull();
  });

  it('uses the excitation at the same position for the transformation ratio', () => {
    const readings: ReadingInput[] = [
      { quantity: 'ac_voltage', circuit: 'rotor', position: 'sensor_end', entered: '4.2' },
      ...voltages('7.0', '1.750', '3.031'),
    ];
    const s1 = judgeMeasurements(readings, OLDER_GENERATION).results[2]!.judgement;
    if (s1.status !== 'judged' || s1.figures.kind !== 'ac_voltage') throw new Error('judged voltage expected');
    // Resolver theory (REFERENCES, worked): E = 7.0 V, K = 0.5 → magnitude 3.5 V, ratio 0.500.
    expect(s1.figures.output!.transformationRatio).toBeCloseTo(0.5, 3);
  });
});

describe('judgeMeasurements — energized outcomes, each way', () => {
  const RATIO_BAND = { ...OLDER_GENERATION, transformationRatio: { min: 0.45, max: 0.6, nearEdgePercent: 5 } };

  // Resolver theory: magnitude = √(S1² + S2²). 2.0 V and 2.0 V → 2.828 V, (2.828 − 2.5) / 2.5 = 13.1 % above
  // the trade's 2–2.5 V (computed; bands common practice, no published source).
  it('output_high when the pair is high with the excitation in range, naming the magnitude and how far above', () => {
    const result = judgeMeasurements(voltages('4.2', '2.0', '2.0'), OLDER_GENERATION);
    expect(result.outcome).toBe('output_high');
    expect(result.reason).toMatch(/^Excitation in range, output high: Stator pair: 2\.828 V is 13\.1 % above/);
    expect(outcomeForStep(result, ['pass', 'low', 'high'])).toBe('high');
    expect(outcomeForStep(result, ['pass', 'excitation_out_of_range', 'output_low', 'output_high'])).toBe('output_high');
  });

  it('a low pair and a low ratio are both named in the output_low reason', () => {
    // √(0.8² + 1.0²) = 1.281 V (36.0 % below 2 V); ratio 1.281 / 4.4 = 0.291 (35.3 % below 0.45) — computed.
    const result = judgeMeasurements(voltages('4.4', '0.8', '1.0'), RATIO_BAND);
    expect(result.outcome).toBe('output_low');
    expect(result.reason).toMatch(/output low: Stator pair: 1\.281 V is 36\.0 % below .* Ratio 0\.291 is 35\.3 % below/);
  });

  it('the excitation reason names the board and the value: 2.9 V is 27.5 % below 4 V (computed)', () => {
    const result = judgeMeasurements(voltages('2.9', '0.8', '1.0'), OLDER_GENERATION);
    expect(result.reason).toMatch(/^Excitation \(the board's drive\): 2\.9 V is 27\.5 % below/);
  });

  it('an excitation near the edge passes but asks for a note; in range says so', () => {
    // 4.6 V is 2.2 % above 4.5 V, inside the 5 % near-edge margin.
    expect(judgeMeasurements(voltages('4.6', '1.3', '1.7'), OLDER_GENERATION)).toMatchObject({ outcome: 'pass', reason: 'All voltages pass; some near the edge: note for the next visit.' });
    expect(judgeMeasurements(voltages('4.2', '1.3', '1.7'), OLDER_GENERATION).reason).toBe('Excitation, stator output and ratio are in range.');
  });

  it('a stator pair near the edge (1.8 V and 1.77 V: 2.524 V, 1.0 % above 2.5 V) also asks for a note', () => {
    expect(judgeMeasurements(voltages('4.2', '1.8', '1.77'), OLDER_GENERATION).reason).toBe('All voltages pass; some near the edge: note for the next visit.');
  });

  it('by ratio alone, a ratio out of band gives output_low or output_high, and the reason says why the ratio was used', () => {
    // 0.78 and 1.02 V → 1.284 V / 4.2 V = 0.306, 32.1 % below 0.45; 2.0 and 2.0 V → 2.828 / 4.2 = 0.673, 12.2 % above 0.6 (computed).
    const low = judgeMeasurements(voltages('4.2', '0.78', '1.02'), RATIO_BAND, { ratioOnly: true });
    expect(low.outcome).toBe('output_low');
    expect(low.reason).toMatch(/^Judged by the transformation ratio only, because the meter does not cover the excitation frequency: Ratio 0\.306 is 32\.1 % below/);
    const high = judgeMeasurements(voltages('4.2', '2.0', '2.0'), RATIO_BAND, { ratioOnly: true });
    expect(high.outcome).toBe('output_high');
    expect(high.reason).toContain('Ratio 0.673 is 12.2 % above');
  });

  it('old procedures: an excitation low maps to low, high to high, read from the rotor wherever it is listed', () => {
    const low = judgeMeasurements(voltages('2.9', '1.3', '1.7'), OLDER_GENERATION);
    expect(outcomeForStep(low, ['pass', 'low', 'high'])).toBe('low');
    // Rotor listed last, the stator pair low: the excitation (5.5 V, high) decides, not the first reading.
    const [rotor, s1, s2] = voltages('5.5', '0.8', '1.0');
    const reordered = judgeMeasurements([s1!, s2!, rotor!], OLDER_GENERATION);
    expect(reordered.outcome).toBe('excitation_out_of_range');
    expect(outcomeForStep(reordered, ['pass', 'low', 'high'])).toBe('high');
  });

  it('an outcome a step does not offer and that has no older equivalent is passed on unchanged', () => {
    const imbalance = judgeMeasurements(windings('89', '66', '74'), OLDER_GENERATION);
    expect(outcomeForStep(imbalance, ['pass', 'low', 'high'])).toBe('imbalance');
  });

  it('the ratio uses the excitation reading wherever it is listed (E = 7.0 V, pair 3.5 V → 0.500)', () => {
    const [rotor, s1, s2] = voltages('7.0', '1.750', '3.031');
    const result = judgeMeasurements([s1!, s2!, rotor!], OLDER_GENERATION);
    const j = result.results[0]!.judgement;
    if (j.status !== 'judged' || j.figures.kind !== 'ac_voltage') throw new Error('judged voltage expected');
    expect(j.figures.output!.transformationRatio).toBeCloseTo(0.5, 3);
  });

  it('an energized step with the excitation only is judged by it', () => {
    const [rotor] = voltages('4.2', '1.3', '1.7');
    expect(judgeMeasurements([rotor!], OLDER_GENERATION)).toMatchObject({ outcome: 'pass', reason: 'Excitation, stator output and ratio are in range.' });
  });

  it('readings that mix voltages and windings are judged as energized, with the stator balance from the windings', () => {
    const result = judgeMeasurements([...voltages('4.2', '1.3', '1.7'), ...windings('89', '66', '74')], OLDER_GENERATION);
    expect(result.reason).toBe('Excitation, stator output and ratio are in range.');
    expect(result.balance?.balanced).toBe(false);
  });
});

describe('judgeMeasurements — the excitation found by circuit, and every failing output named', () => {
  it('an excitation listed last still decides: pair 1.3 / 1.7 V in range, excitation 5.5 V high', () => {
    const [rotor, s1, s2] = voltages('5.5', '1.3', '1.7');
    expect(judgeMeasurements([s1!, s2!, rotor!], OLDER_GENERATION).outcome).toBe('excitation_out_of_range');
  });

  it('output high on magnitude and ratio names both, one after the other', () => {
    // 2.828 V is 13.1 % above 2.5 V; 2.828 / 4.2 = 0.673 is 12.2 % above 0.6 (computed).
    const band = { ...OLDER_GENERATION, transformationRatio: { min: 0.45, max: 0.6, nearEdgePercent: 5 } };
    const result = judgeMeasurements(voltages('4.2', '2.0', '2.0'), band);
    expect(result.outcome).toBe('output_high');
    expect(result.reason).toMatch(/2\.828 V is 13\.1 % above .*%\. Ratio 0\.673 is 12\.2 % above/);
  });
});
