import type { ReadingInput } from '../schemas/reading';
import { judgeMeasurements } from './judge-measurements';
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

  it('gives low when the stator pair is low with good excitation', () => {
    const result = judgeMeasurements(voltages('4.2', '0.8', '1.0'), OLDER_GENERATION);
    expect(result.outcome).toBe('low');
    expect(result.reason).toContain('Stator pair');
  });
});
