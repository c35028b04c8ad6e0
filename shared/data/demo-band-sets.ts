import type { BandSet } from '../schemas/band-set';

const INVENTED = 'Invented demo values — not from any manufacturer. An admin replaces them with real values.';

/**
 * INVENTED DEMO DATA. Two made-up sensor generations with made-up values, chosen to be clearly
 * unlike any real sensor so nobody mistakes them for reference figures.
 */
export const DEMO_BAND_SETS: readonly BandSet[] = [
  {
    generationKey: 'demo-gen-1',
    version: 1,
    values: {
      label: 'Demo generation 1 (invented)',
      referenceTemperatureC: 20,
      windings: {
        rotor: { nominal: 120, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 12, openAbove: 2000 },
        stator_1: { nominal: 55, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 5.5, openAbove: 2000 },
        stator_2: { nominal: 55, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 5.5, openAbove: 2000 },
      },
      statorBalancePercent: 5,
      excitation: { min: 5.5, max: 6.5, nearEdgePercent: 5 },
      statorOutputMagnitude: { min: 2.8, max: 3.4, nearEdgePercent: 5 },
      invented: true,
      note: INVENTED,
    },
  },
  {
    generationKey: 'demo-gen-2',
    version: 1,
    values: {
      label: 'Demo generation 2 (invented)',
      referenceTemperatureC: 25,
      windings: {
        rotor: { nominal: 48, inBandPercent: 7, nearEdgePercent: 12, shortBelow: 4.8, openAbove: 1500 },
        stator_1: { nominal: 130, inBandPercent: 7, nearEdgePercent: 12, shortBelow: 13, openAbove: 3000 },
        stator_2: { nominal: 130, inBandPercent: 7, nearEdgePercent: 12, shortBelow: 13, openAbove: 3000 },
      },
      statorBalancePercent: 4,
      excitation: { min: 3.0, max: 3.6, nearEdgePercent: 5 },
      statorOutputMagnitude: { min: 1.4, max: 1.8, nearEdgePercent: 5 },
      invented: true,
      note: INVENTED,
    },
  },
];
