import type { BandSetVersionRecord, ProcedureDiagram } from '@shared/schemas/admin-reference';
import type { BandSetValues } from '@shared/schemas/band-set';

// Invented test data: round numbers chosen so a test can say which way a reading falls by eye.
export const INVENTED_BANDS: BandSetValues = {
  label: 'Test generation (invented)',
  referenceTemperatureC: 20,
  windings: {
    rotor: { nominal: 100, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 10, openAbove: 2000 },
    stator_1: { nominal: 50, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 5, openAbove: 2000 },
    stator_2: { nominal: 50, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 5, openAbove: 2000 },
  },
  statorBalancePercent: 5,
  excitation: { min: 4.0, max: 4.5, nearEdgePercent: 5 },
  statorOutputMagnitude: { min: 1.9, max: 2.1, nearEdgePercent: 5 },
  invented: true,
  note: 'Invented values for tests.',
};

export function bandSetRecord(overrides: Partial<BandSetVersionRecord> = {}): BandSetVersionRecord {
  return { id: 7, generation: 'test-gen', version: 2, label: INVENTED_BANDS.label, bands: INVENTED_BANDS, publishedAt: null, createdAt: '2026-01-01T00:00:00.000Z', ...overrides };
}

/** A made-up four-step procedure whose "no" branch names a step that does not exist. */
export const BROKEN_DIAGRAM: ProcedureDiagram = {
  start: 'at-rest',
  layers: 4,
  nodes: [
    { id: 'at-rest', kind: 'safety_gate', title: 'Press at rest', layer: 0, index: 0, reachable: true },
    { id: 'connector-check', kind: 'check', title: 'Connector seated', layer: 1, index: 0, reachable: true },
    { id: 'rotor-resistance', kind: 'measure', title: 'Rotor resistance', layer: 2, index: 0, reachable: true },
    { id: 'sensor-fault', kind: 'finding', title: 'Sensor winding fault', layer: 3, index: 0, reachable: true, cause: 'sensor' },
  ],
  edges: [
    { from: 'at-rest', to: 'connector-check', label: 'Confirmed', missingTarget: false },
    { from: 'connector-check', to: 'rotor-resistance', label: 'Seated', missingTarget: false },
    { from: 'connector-check', to: 'no-such-step', label: 'Not seated', missingTarget: true },
    { from: 'rotor-resistance', to: 'sensor-fault', label: 'Rotor pass', missingTarget: false },
    { from: 'rotor-resistance', to: 'sensor-fault', label: 'Rotor high', missingTarget: false },
  ],
};
