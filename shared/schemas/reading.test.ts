import { CIRCUIT_LEADS, readingInputSchema } from './reading';

describe('readingInputSchema', () => {
  it('accepts a control-end reading with its cable and temperature', () => {
    const reading = {
      quantity: 'resistance',
      circuit: 'stator_1',
      position: 'control_end',
      entered: '70.4 Ω',
      windingTemperatureC: 31,
      cable: { awg: 22, length: 15, lengthUnit: 'm', lengthIs: 'one_way' },
    };
    expect(readingInputSchema.parse(reading)).toEqual(reading);
  });

  it('rejects a word outside the vocabulary', () => {
    expect(readingInputSchema.safeParse({ quantity: 'dc_voltage', circuit: 'rotor', position: 'control_end', entered: '1' }).success).toBe(false);
  });

  it('names the lead pairs of each circuit', () => {
    expect(CIRCUIT_LEADS).toEqual({ rotor: 'R1–R2', stator_1: 'S1–S3', stator_2: 'S2–S4' });
  });
});
