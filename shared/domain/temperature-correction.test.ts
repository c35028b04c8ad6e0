import fc from 'fast-check';
import { FC_SEED } from './testing/fast-check-seed';
import { COPPER_INFERRED_ZERO_C, copperTemperatureCoefficient, correctCopperResistance } from './temperature-correction';

describe('correctCopperResistance', () => {
  // R2 = R1 × (234.5 + T2)/(234.5 + T1): IEC 60228 temperature-correction guidance; IEEE C57.12.90 (from memory).
  it('uses the 234.5 °C copper constant', () => {
    expect(COPPER_INFERRED_ZERO_C).toBe(234.5);
  });

  it('corrects 52.0 Ω at 32 °C to 49.66 Ω at 20 °C (REFERENCES worked value, computed)', () => {
    expect(correctCopperResistance(52.0, 32, 20)).toBeCloseTo(49.66, 2);
  });

  it('corrects 1.21 Ω at 20 °C to 1.4715 Ω at 75 °C (REFERENCES worked value, computed)', () => {
    expect(correctCopperResistance(1.21, 20, 75)).toBeCloseTo(1.4715, 4);
  });

  it('gives the copper coefficient 0.00393 per °C at 20 °C (1/254.5)', () => {
    expect(copperTemperatureCoefficient(20)).toBeCloseTo(0.00393, 5);
  });

  it('raises a winding about 0.4 % per °C near room temperature (resolver/copper note in REFERENCES)', () => {
    const rise = correctCopperResistance(100, 20, 21) / 100 - 1;
    expect(rise).toBeGreaterThan(0.0038);
    expect(rise).toBeLessThan(0.0041);
  });

  it('round-trips: correcting there and back returns the reading (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 1e6, noNaN: true }),
        fc.double({ min: -40, max: 150, noNaN: true }),
        fc.double({ min: -40, max: 150, noNaN: true }),
        (ohms, from, to) => {
          const back = correctCopperResistance(correctCopperResistance(ohms, from, to), to, from);
          expect(back).toBeCloseTo(ohms, 6);
        },
      ), { seed: FC_SEED },
    );
  });

  it('refuses temperatures at or below the inferred zero', () => {
    expect(() => correctCopperResistance(10, -234.5, 20)).toThrow(RangeError);
  });
});

describe('correctCopperResistance — the range guard names the temperature', () => {
  it('refuses a target below the inferred zero and non-finite temperatures, naming the value', () => {
    expect(() => correctCopperResistance(10, 20, -240)).toThrow('A copper temperature of -240 °C is outside the range the correction covers.');
    expect(() => correctCopperResistance(10, Number.NaN, 20)).toThrow(RangeError);
    expect(() => correctCopperResistance(10, 20, Number.POSITIVE_INFINITY)).toThrow(RangeError);
    expect(correctCopperResistance(10, -234, 20)).toBeCloseTo((10 * 254.5) / 0.5, 9);
  });
});
