import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import type supertest from 'supertest';
import { BandSetVersion } from '../server/modules/reference/reference.model';

/**
 * A band set made up for the API tests only (not demo data, not a check of the engine): round
 * numbers so a test can say which way a reading falls without arithmetic.
 */
export async function makeTestBandSet(generation = 'test-gen') {
  return BandSetVersion.create({
    generation,
    version: 1,
    label: 'Test generation (made up for tests)',
    bands: {
      label: 'Test generation (made up for tests)',
      referenceTemperatureC: 20,
      windings: {
        rotor: { nominal: 100, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 10, openAbove: 2000 },
        stator_1: { nominal: 50, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 5, openAbove: 2000 },
        stator_2: { nominal: 50, inBandPercent: 8, nearEdgePercent: 15, shortBelow: 5, openAbove: 2000 },
      },
      statorBalancePercent: 5,
      excitation: { min: 4.0, max: 4.5, nearEdgePercent: 5 },
      statorOutputMagnitude: { min: 2.0, max: 2.5, nearEdgePercent: 5 },
      invented: true,
      note: 'Made up for tests.',
    },
    publishedAt: new Date(),
    createdBy: null,
  });
}

export const answer = (agent: supertest.Agent, visitId: number, stepId: string, body: Record<string, unknown>) =>
  agent.put(`/api/visits/${visitId}/steps/${stepId}`).send({ id: randomUUID(), ...body });

export const reading = (agent: supertest.Agent, visitId: number, body: Record<string, unknown>) =>
  agent.post(`/api/visits/${visitId}/readings`).send({ id: randomUUID(), ...body });

export async function signaturePng(): Promise<string> {
  const png = await sharp({ create: { width: 300, height: 100, channels: 3, background: '#ffffff' } })
    .composite([{ input: Buffer.from('<svg width="300" height="100"><path d="M10 80 C 60 10, 120 90, 290 20" stroke="black" stroke-width="4" fill="none"/></svg>'), top: 0, left: 0 }])
    .png()
    .toBuffer();
  return `data:image/png;base64,${png.toString('base64')}`;
}

/** Answers the steps from the start up to the de-energized resistance test at the control end. */
export async function workToResistanceStep(agent: supertest.Agent, visitId: number) {
  const steps: [string, Record<string, unknown>][] = [
    ['press-at-rest', { confirmed: true }],
    ['firmware-versions', { inputs: { press_control_version: '3.4', monitor_module_version: '1.9' } }],
    ['lockout', { confirmed: true }],
    ['identify-generation', { outcome: 'nameplate', inputs: { sensor_generation: 'test-gen' } }],
    ['monitor-jumper', { outcome: 'yes' }],
    ['connector-coupling', { outcome: 'secure' }],
    ['wiring-conductors', { outcome: 'sound' }],
  ];
  for (const [stepId, body] of steps) {
    const res = await answer(agent, visitId, stepId, body);
    if (res.status !== 200) throw new Error(`${stepId}: ${res.status} ${JSON.stringify(res.body)}`);
  }
}

export async function windingReadings(agent: supertest.Agent, visitId: number, stepId: string, position: string, values: Record<string, string>) {
  for (const [circuit, entered] of Object.entries(values)) {
    const res = await reading(agent, visitId, { stepId, quantity: 'resistance', circuit, position, entered });
    if (res.status !== 200) throw new Error(`${circuit}: ${res.status} ${JSON.stringify(res.body)}`);
  }
}

/**
 * A close-out's as-left part for a press returned to production with every check confirmed
 * (the crank-angle settings check too, which sensor findings require); overrides change single checks.
 */
export function returnedToProduction(overrides: Record<string, unknown> = {}): { asLeft: 'returned_to_production'; returnToService: Record<string, unknown> } {
  return {
    asLeft: 'returned_to_production' as const,
    returnToService: {
      faultCleared: true,
      tdcAgrees: true,
      crankAngleSettingsVerified: true,
      guardsRefitted: true,
      toolsRemoved: true,
      everyoneClear: true,
      singleStroke: true,
      stoppingTimeChecked: true,
      presenceSensingDistanceOk: 'not_fitted',
      twoHandDevice: 'not_fitted',
      ...overrides,
    },
  };
}
