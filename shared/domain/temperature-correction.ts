import type { Celsius, Ohms } from './units';

/**
 * Inferred absolute-zero-resistance temperature of annealed copper, in °C: the constant of the
 * copper correction R2 = R1 × (234.5 + T2) / (234.5 + T1).
 */
export const COPPER_INFERRED_ZERO_C = 234.5;

/** Resistance of a copper winding at `toC`, given its value measured at `fromC`. */
export function correctCopperResistance(measured: Ohms, fromC: Celsius, toC: Celsius): Ohms {
  for (const t of [fromC, toC]) {
    if (!Number.isFinite(t) || t <= -COPPER_INFERRED_ZERO_C) {
      throw new RangeError(`A copper temperature of ${t} °C is outside the range the correction covers.`);
    }
  }
  return (measured * (COPPER_INFERRED_ZERO_C + toC)) / (COPPER_INFERRED_ZERO_C + fromC);
}

/** Temperature coefficient of copper resistance per °C at `atC` (1/254.5 at 20 °C). */
export function copperTemperatureCoefficient(atC: Celsius): number {
  return 1 / (COPPER_INFERRED_ZERO_C + atC);
}
