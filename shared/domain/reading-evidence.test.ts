import type { BandSetValues } from '../schemas/band-set';
import type { Position, ReadingInput } from '../schemas/reading';
import { judgeMeasurements } from './judge-measurements';
import { evidenceFromReadings } from './reading-evidence';
import { OLDER_GENERATION } from './testing/trade-fact-band-sets';

// Trade reasoning (common practice, no published source): a winding failing at the sensor end is the
// sensor; the excitation comes from the board's drive; with the excitation in range, an output (vector
// magnitude or transformation ratio) off its band points at the sensor side. Bands: older generation
// 89 Ω / 70 Ω, 4–4.5 V, 2–2.5 V (test check values). Figures below are computed by hand.

const windings = (position: Position, rotor: string, s1: string, s2: string): ReadingInput[] => [
  { quantity: 'resistance', circuit: 'rotor', position, entered: rotor },
  { quantity: 'resistance', circuit: 'stator_1', position, entered: s1 },
  { quantity: 'resistance', circuit: 'stator_2', position, entered: s2 },
];
const volts = (e: string | null, s1: string, s2: string): ReadingInput[] => [
  ...(e === null ? [] : [{ quantity: 'ac_voltage' as const, circuit: 'rotor' as const, position: 'control_end' as const, entered: e }]),
  { quantity: 'ac_voltage', circuit: 'stator_1', position: 'control_end', entered: s1 },
  { quantity: 'ac_voltage', circuit: 'stator_2', position: 'control_end', entered: s2 },
];
const evidence = (readings: ReadingInput[], band: BandSetValues = OLDER_GENERATION) =>
  evidenceFromReadings(judgeMeasurements(readings, band).results);
const weights = (readings: ReadingInput[], band?: BandSetValues) => evidence(readings, band).map((e) => [e.cause, e.weight]);
const withRatio = (min: number, max: number, nearEdgePercent: number): BandSetValues => ({ ...OLDER_GENERATION, transformationRatio: { min, max, nearEdgePercent } });

describe('evidenceFromReadings — windings', () => {
  it('windings measured at the sensor end only, all right, still count against sensor and cable', () => {
    expect(weights(windings('sensor_end', '89', '70', '70'))).toEqual([['sensor', -2], ['cable', -2]]);
  });

  it('a short at the sensor end (0.5 Ω, low) points at the sensor with weight 3', () => {
    expect(evidence(windings('sensor_end', '89', '0.5', '70'))).toEqual([
      { cause: 'sensor', weight: 3, because: "S1–S3 fails at the sensor end: the sensor's winding." },
    ]);
  });

  it('a winding failing with the voltages in range: the winding rules speak, the voltages only clear the board', () => {
    // Stator 1 open at the control end; 4.2 V excitation and 1.3 / 1.7 V (2.14 V) in range.
    expect(weights([...windings('control_end', '89', 'OL', '70'), ...volts('4.2', '1.3', '1.7')])).toEqual([['sensor', 1], ['cable', 1], ['board', -2]]);
  });

  it('a rotor winding off does not count as the excitation: with 4.2 V across the rotor the board is cleared', () => {
    const found = evidence([...windings('control_end', 'OL', '70', '70'), ...volts('4.2', '1.3', '1.7')]);
    expect(found.find((e) => e.cause === 'board')).toEqual({ cause: 'board', weight: -2, because: 'Excitation and output read right.' });
  });
});

describe('evidenceFromReadings — voltages', () => {
  it('excitation in range, output high (2.0 V and 2.0 V: 2.828 V): sensor 1 and board 1, saying why', () => {
    const because = "The excitation is in range but the output reads high: a sensor of another generation, or the board's reading side.";
    expect(evidence(volts('4.2', '2.0', '2.0'))).toEqual([
      { cause: 'sensor', weight: 1, because },
      { cause: 'board', weight: 1, because },
    ]);
  });

  it('excitation in range, output low: the reasons name the sensor side and clear the drive', () => {
    expect(evidence(volts('4.2', '0.8', '1.0'))).toEqual([
      { cause: 'sensor', weight: 3, because: 'The excitation is in range but the output (magnitude or ratio) reads low: the sensor or its cable, not the drive.' },
      { cause: 'cable', weight: 3, because: 'The excitation is in range but the output (magnitude or ratio) reads low: the sensor or its cable, not the drive.' },
      { cause: 'board', weight: -1, because: 'The board drives the excitation in range.' },
    ]);
  });

  it('a low ratio alone reads as output low: 4.4 V, pair 2.0 V in range, ratio 0.455 under 0.47', () => {
    expect(weights(volts('4.4', '1.2', '1.6'), withRatio(0.47, 0.6, 2))).toEqual([['sensor', 3], ['cable', 3], ['board', -1]]);
  });

  it('a high ratio alone reads as output high: 4.0 V, pair 1.5 / 2.0 V = 2.5 V in range, ratio 0.625 over 0.55', () => {
    expect(weights(volts('4.0', '1.5', '2.0'), withRatio(0.45, 0.55, 2))).toEqual([['sensor', 1], ['board', 1]]);
  });

  it('a ratio in band or near its edge is a pass: 2.14 V / 4.2 V = 0.510', () => {
    expect(weights(volts('4.2', '1.3', '1.7'), withRatio(0.45, 0.6, 5))).toEqual([['board', -2]]);
    // 0.510 is 1.9 % above 0.5, inside a 5 % near-edge margin.
    expect(weights(volts('4.2', '1.3', '1.7'), withRatio(0.45, 0.5, 5))).toEqual([['board', -2]]);
  });

  it('without an excitation reading the output alone says nothing', () => {
    expect(evidence(volts(null, '0.8', '1.0'))).toEqual([]);
  });

  it('an excitation in range without stator outputs says nothing either', () => {
    expect(evidence(volts('4.2', '1.3', '1.7').slice(0, 1))).toEqual([]);
  });
});
