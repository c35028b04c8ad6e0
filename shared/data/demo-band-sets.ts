import type { BandSet } from '../schemas/band-set';

const INVENTED = 'Invented demo values — not from any manufacturer. An admin replaces them with real values.';

/**
 * INVENTED DEMO DATA. Two made-up sensor generations with made-up values: invented, not taken
 * from any maker's data. Version 2 adds a transformation-ratio band and an excitation frequency
 * (also invented); version 1 rows stay in databases seeded before, frozen as published.
 */
export const DEMO_BAND_SETS: readonly BandSet[] = [
  {
    generation: 'demo-gen-1',
    version: 2,
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
      transformationRatio: { min: 0.47, max: 0.57, nearEdgePercent: 5 },
      excitationFrequencyHz: 5000,
      invented: true,
      note: INVENTED,
    },
  },
  {
    generation: 'demo-gen-2',
    version: 2,
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
      transformationRatio: { min: 0.44, max: 0.53, nearEdgePercent: 5 },
      excitationFrequencyHz: 2500,
      invented: true,
      note: INVENTED,
    },
  },
];
