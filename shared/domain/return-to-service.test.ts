import { describe, expect, it } from 'vitest';
import { CRANK_ANGLE_PROCEDURE } from '../data/crank-angle-procedure';
import type { FindingStep, Step } from '../schemas/procedure';
import { returnToServiceDistances, returnToServiceNeeds, roundUpTenth } from './return-to-service';

const step = (id: string): Step => CRANK_ANGLE_PROCEDURE.definition.steps.find((s) => s.id === id)!;

/** A finding made up for this test: no tags, only the words given. */
const madeUpFinding = (words: string): FindingStep => ({
  id: 'finding-made-up',
  kind: 'finding',
  title: 'Made-up finding',
  instructions: words,
  conclusion: 'Made up for this test.',
  recommendedAction: 'Nothing.',
  cause: 'sensor',
  escalate: false,
});

// After a sensor is replaced or re-aligned, every setting taken from the crank angle (top stop,
// light-curtain muting on the upstroke only, cam outputs) must be verified before production:
// common practice, no published source.
describe('returnToServiceNeeds', () => {
  it('asks for the crank-angle settings after the sensor findings (the work sets top dead centre again)', () => {
    expect(returnToServiceNeeds(step('finding-sensor'))).toEqual({ crankAngleSettings: true });
    expect(returnToServiceNeeds(step('finding-drive'))).toEqual({ crankAngleSettings: true });
  });

  it('does not ask after a cable or connector finding, a step that is not a finding, or none', () => {
    expect(returnToServiceNeeds(step('finding-cable'))).toEqual({ crankAngleSettings: false });
    expect(returnToServiceNeeds(step('finding-connector'))).toEqual({ crankAngleSettings: false });
    expect(returnToServiceNeeds(step('lockout'))).toEqual({ crankAngleSettings: false });
    expect(returnToServiceNeeds(null)).toEqual({ crankAngleSettings: false });
    expect(returnToServiceNeeds(undefined)).toEqual({ crankAngleSettings: false });
    // Only a finding closes a visit: a step that is not one asks nothing, whatever its words.
    const inspect = { ...madeUpFinding('Re-align the sensor at top dead centre.'), kind: 'inspect' } as unknown as Step;
    expect(returnToServiceNeeds(inspect)).toEqual({ crankAngleSettings: false });
  });

  it('reads the words of any finding: re-align, re-time, or moving to top dead centre', () => {
    expect(returnToServiceNeeds(madeUpFinding('Re-align the sensor to the crank.')).crankAngleSettings).toBe(true);
    expect(returnToServiceNeeds(madeUpFinding('Realign the coupling.')).crankAngleSettings).toBe(true);
    expect(returnToServiceNeeds(madeUpFinding('Re-time the sensor.')).crankAngleSettings).toBe(true);
    expect(returnToServiceNeeds(madeUpFinding('Retime the sensor.')).crankAngleSettings).toBe(true);
    expect(returnToServiceNeeds(madeUpFinding('Set the crank at top dead centre.')).crankAngleSettings).toBe(true);
    expect(returnToServiceNeeds(madeUpFinding('Tighten the terminal screw.')).crankAngleSettings).toBe(false);
    // "timer" is not "re-time"; "aligned" alone is not a re-alignment.
    expect(returnToServiceNeeds(madeUpFinding('Check the timer relay; the guard is aligned.')).crankAngleSettings).toBe(false);
  });
});

describe('roundUpTenth — a minimum distance is rounded up, never down', () => {
  it('lifts 11.34 to 11.4 and keeps 11.3 and 0 as they are', () => {
    expect(roundUpTenth(11.34)).toBe(11.4);
    expect(roundUpTenth(11.3)).toBe(11.3);
    expect(roundUpTenth(0)).toBe(0);
    expect(roundUpTenth(11.31)).toBe(11.4);
  });

  it('keeps a float error such as 63 × 0.2 = 12.600000000000001 at 12.6', () => {
    expect(63 * 0.2).not.toBe(12.6);
    expect(roundUpTenth(63 * 0.2)).toBe(12.6);
  });
});

describe('returnToServiceDistances', () => {
  it('presence-sensing device, 180 ms: OSHA 1910.217(c)(3)(iii)(e) 63 × 0.18 = 11.34 in → 11.4 in; 288.036 mm → 288.1 mm (computed)', () => {
    expect(returnToServiceDistances({ stoppingTimeMs: 180, presenceSensingDistanceOk: 'yes', twoHandDevice: 'not_fitted' })).toEqual([
      { device: 'presence_sensing', inches: 11.4, millimetres: 288.1, standard: 'OSHA 29 CFR 1910.217(c)(3)(iii)(e)', formula: 'Ds = 63 in/s × 0.18 s' },
    ]);
  });

  it('two-hand control, 200 ms: OSHA 1910.217(c)(3)(vii)(c) 63 × 0.2 = 12.6 in; 320.04 mm → 320.1 mm (computed)', () => {
    expect(returnToServiceDistances({ stoppingTimeMs: 200, presenceSensingDistanceOk: 'not_fitted', twoHandDevice: 'control' })).toEqual([
      { device: 'two_hand_control', inches: 12.6, millimetres: 320.1, standard: 'OSHA 29 CFR 1910.217(c)(3)(vii)(c)', formula: 'Ds = 63 in/s × 0.2 s' },
    ]);
  });

  it('two-hand trip, 40 strokes/min and 4 engaging points: OSHA 1910.217(c)(3)(viii)(c) Tm = 0.75 × 1.5 s = 1.125 s, 70.875 in → 70.9 in; 1800.225 mm → 1800.3 mm (computed)', () => {
    const [trip] = returnToServiceDistances({ presenceSensingDistanceOk: 'not_fitted', twoHandDevice: 'trip', strokesPerMinute: 40, engagingPoints: 4 });
    expect(trip).toMatchObject({ device: 'two_hand_trip', inches: 70.9, millimetres: 1800.3, standard: 'OSHA 29 CFR 1910.217(c)(3)(viii)(c)' });
  });

  it('lists a presence-sensing device and a two-hand control together, in that order', () => {
    const both = returnToServiceDistances({ stoppingTimeMs: 180, presenceSensingDistanceOk: 'yes', twoHandDevice: 'control' });
    expect(both.map((d) => [d.device, d.inches])).toEqual([
      ['presence_sensing', 11.4],
      ['two_hand_control', 11.4],
    ]);
  });

  it('claims no distance without the figures its formula needs, or for a device not fitted', () => {
    expect(returnToServiceDistances({ presenceSensingDistanceOk: 'yes', twoHandDevice: 'control' })).toEqual([]);
    expect(returnToServiceDistances({ stoppingTimeMs: 0, presenceSensingDistanceOk: 'yes', twoHandDevice: 'control' })).toEqual([]);
    expect(returnToServiceDistances({ stoppingTimeMs: 180, presenceSensingDistanceOk: 'not_fitted', twoHandDevice: 'not_fitted' })).toEqual([]);
    expect(returnToServiceDistances({ stoppingTimeMs: 180, presenceSensingDistanceOk: 'not_fitted', twoHandDevice: 'trip', strokesPerMinute: 40 })).toEqual([]);
    expect(returnToServiceDistances({ stoppingTimeMs: 180, presenceSensingDistanceOk: 'not_fitted', twoHandDevice: 'trip', engagingPoints: 4 })).toEqual([]);
    // Trip figures left over from an earlier choice do not make a trip distance for a control or no station.
    const leftover = { strokesPerMinute: 40, engagingPoints: 4, presenceSensingDistanceOk: 'not_fitted' } as const;
    expect(returnToServiceDistances({ ...leftover, twoHandDevice: 'not_fitted' })).toEqual([]);
    expect(returnToServiceDistances({ ...leftover, twoHandDevice: 'control' })).toEqual([]);
    expect(returnToServiceDistances({})).toEqual([]);
  });

  it('takes a stopping time just above 0 (the schema allows 0.001 ms)', () => {
    const [d] = returnToServiceDistances({ stoppingTimeMs: 0.001, presenceSensingDistanceOk: 'yes', twoHandDevice: 'not_fitted' });
    // 63 × 0.000001 s = 0.000063 in → 0.1 in rounded up.
    expect(d?.inches).toBe(0.1);
  });
});
