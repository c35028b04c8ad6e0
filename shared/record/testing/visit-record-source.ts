import { DEMO_BAND_SETS } from '../../data/demo-band-sets';
import { CRANK_ANGLE_PROCEDURE } from '../../data/crank-angle-procedure';
import { judgeEntry } from '../../domain/judge-entry';
import type { ReadingInput } from '../../schemas/reading';
import type { VisitRecordSource } from '../build-visit-record';

// Everything below is invented: company, people, plant, press and the demo band set (demo-gen-1).
const BANDS = DEMO_BAND_SETS[0]!.values;
export const AT = (min: number) => new Date(Date.UTC(2026, 11, 2, 8, min)).toISOString();

function reading(id: string, stepId: string, input: ReadingInput, supersededAt: string | null = null): VisitRecordSource['readings'][number] {
  // The real engine judges each reading, as the server does when it is saved.
  const j = judgeEntry(input, BANDS);
  return {
    id,
    stepId,
    quantity: input.quantity,
    circuit: input.circuit,
    position: input.position,
    entered: input.entered,
    windingTemperatureC: input.windingTemperatureC ?? null,
    cable: input.cable ?? null,
    verdict: j.status === 'judged' ? j.verdict : null,
    reason: j.status === 'judged' ? j.reason : '',
    judgement: j as unknown as Record<string, unknown>,
    supersededAt,
  };
}

const result = (stepId: string, outcome: string, extra: Partial<VisitRecordSource['results'][number]> = {}): VisitRecordSource['results'][number] => ({
  stepId,
  outcome,
  inputs: {},
  note: null,
  confirmedAt: null,
  createdBy: 7,
  supersededAt: null,
  ...extra,
});

/** A closed visit at the sensor finding, as the server would read it: a replaced reading, one off the path, a photo, two signatures. */
export function recordSource(overrides: Partial<VisitRecordSource> = {}): VisitRecordSource {
  const res = (circuit: ReadingInput['circuit'], position: ReadingInput['position'], entered: string, extra: Partial<ReadingInput> = {}): ReadingInput => ({
    quantity: 'resistance',
    circuit,
    position,
    entered,
    ...extra,
  });
  return {
    companyName: 'Ridgeline Press Service (invented demo company)',
    timeZone: 'America/Chicago',
    visit: {
      id: 42,
      status: 'closed',
      faultDisplayed: 'Crank angle sensor fault 31',
      startedAt: AT(0),
      closedAt: AT(95),
      signedAt: AT(94),
      causeCategory: 'sensor',
      actionsTaken: 'Replaced the sensor (invented).',
      recommendations: null,
      labourMinutes: 95,
      travelMinutes: 40,
      asLeftState: 'returned_to_production',
      returnToService: {
        faultCleared: true,
        tdcAgrees: true,
        crankAngleSettingsVerified: true,
        guardsRefitted: true,
        toolsRemoved: true,
        everyoneClear: true,
        singleStroke: true,
        stoppingTimeChecked: true,
        stoppingTimeMs: 180,
        presenceSensingDistanceOk: 'not_fitted',
        twoHandDevice: 'control',
        twoHandDistanceOk: true,
      },
      lockedOut: null,
      cancellation: null,
      contactName: 'Ines Varga (invented)',
      contactEmail: 'ines@plant.example',
      controlFirmwareFound: '3.4',
      controlFirmwareLeft: '3.4',
      monitorFirmwareFound: '1.9',
      monitorFirmwareLeft: '1.9',
    },
    customer: { name: 'Harlow Stamping Works (invented)' },
    site: { name: 'Main plant (invented)', address: '400 Foundry Road (invented)', city: null },
    press: { assetTag: 'HS-P07', model: 'SR-250 (invented model)', tonnage: 250, capacityUnit: 'us_ton', controlModel: null, sensorGeneration: 'demo-gen-1' },
    technicianName: 'Dana Okafor (invented)',
    procedure: { title: CRANK_ANGLE_PROCEDURE.title, version: 1, definition: CRANK_ANGLE_PROCEDURE.definition },
    bandSet: { label: BANDS.label, generation: 'demo-gen-1', version: 1, bands: BANDS },
    results: [
      result('press-at-rest', 'confirmed', { confirmedAt: AT(5) }),
      result('firmware-versions', 'compatible', { inputs: { press_control_version: '3.4', monitor_module_version: '1.9' } }),
      result('lockout', 'confirmed', { confirmedAt: AT(10), createdBy: 8 }),
      result('identify-generation', 'infer', { supersededAt: AT(12) }),
      result('identify-generation', 'nameplate'),
      result('monitor-jumper', 'yes'),
      result('connector-coupling', 'secure', { note: 'Ring tight (invented note).' }),
      result('wiring-conductors', 'sound'),
      result('resistance-control-end', 'high'),
      result('resistance-sensor-end', 'high'),
    ],
    readings: [
      reading('r1', 'resistance-control-end', res('rotor', 'control_end', 'OL')),
      reading('r2-old', 'resistance-control-end', res('stator_1', 'control_end', '80'), AT(30)),
      reading('r2', 'resistance-control-end', res('stator_1', 'control_end', '0.080 kΩ')),
      reading('r3', 'resistance-control-end', res('stator_2', 'control_end', '55', { windingTemperatureC: 35 })),
      reading('r4', 'resistance-sensor-end', res('rotor', 'sensor_end', 'OL')),
      // An answer left behind on a branch the visit no longer takes.
      reading('r5', 'sensor-markings', res('rotor', 'sensor_end', '120')),
    ],
    parts: [{ id: 'p1', partNumber: 'DEMO-RS-100', description: 'Crank-angle sensor (invented part)', quantity: 1, serialRemoved: 'DEMO-SN-0417', serialFitted: 'DEMO-SN-0923' }],
    attachments: [
      { id: 'a1', kind: 'photo', caption: 'Sensor connector', stepId: 'connector-coupling', hasThumb: true },
      { id: 's1', kind: 'signature', caption: null, stepId: null, hasThumb: true },
      { id: 's2', kind: 'signature', caption: null, stepId: null, hasThumb: true },
    ],
    people: { 7: 'Dana Okafor (invented)', 8: 'Marek Lindqvist (invented)' },
    issue: { number: 1, issuedAt: AT(96), expiresAt: AT(200), acknowledgedAt: null, acknowledgedBy: null },
    ...overrides,
  };
}
