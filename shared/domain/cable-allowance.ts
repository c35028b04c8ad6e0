import type { Cable } from '../schemas/reading';
import { correctCopperResistance } from './temperature-correction';
import { FEET_PER_METRE, type Celsius, type Feet, type Inches, type Ohms, type OhmsPerThousandFeet } from './units';

/** Annealed copper at 20 °C (IACS 1913) in ohm·circular-mil per foot. */
export const IACS_COPPER_OHM_CMIL_PER_FT = 10.371;

/** Diameter of a solid AWG conductor: d = 0.005 in × 92^((36 − n)/39). */
export function awgDiameter(awg: number): Inches {
  return 0.005 * 92 ** ((36 - awg) / 39);
}

/** Resistance per 1000 ft of solid annealed copper of this gauge at `temperatureC`. */
export function copperResistancePerThousandFeet(awg: number, temperatureC: Celsius = 20): OhmsPerThousandFeet {
  const mils = awgDiameter(awg) * 1000;
  const at20 = (IACS_COPPER_OHM_CMIL_PER_FT / (mils * mils)) * 1000;
  return correctCopperResistance(at20, 20, temperatureC);
}

export interface CableAllowance {
  /** Wire actually in the measured loop: both conductors, out and back. */
  loopLength: Feet;
  temperatureC: Celsius;
  resistance: Ohms;
}

/**
 * Resistance the cable adds to a reading taken at the control end: the loop through both
 * conductors. Modelled as solid copper; stranded conductors run a few percent higher.
 */
export function cableLoopResistance(cable: Cable, fallbackTemperatureC: Celsius = 20): CableAllowance {
  const run = cable.lengthUnit === 'm' ? cable.length * FEET_PER_METRE : cable.length;
  const loopLength = cable.lengthIs === 'one_way' ? 2 * run : run;
  const temperatureC = cable.temperatureC ?? fallbackTemperatureC;
  const resistance = (copperResistancePerThousandFeet(cable.awg, temperatureC) * loopLength) / 1000;
  return { loopLength, temperatureC, resistance };
}
