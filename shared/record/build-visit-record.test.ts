import { describe, expect, it } from 'vitest';
import { CRANK_ANGLE_PROCEDURE } from '../data/crank-angle-procedure';
import { RETURN_TO_SERVICE } from '../data/safety-messages';
import { visitRecordSchema } from '../schemas/visit-record';
import { buildVisitRecord } from './build-visit-record';
import { RETURN_TO_SERVICE_CHECKS } from './record-wording';
import { AT, recordSource as source } from './testing/visit-record-source';

describe('the visit record builder', () => {
  it('builds a record the shared schema accepts, with the header in words', () => {
    const record = buildVisitRecord(source());
    expect(visitRecordSchema.parse(record)).toEqual(record);
    expect(record.title).toBe('Service report V-000042');
    expect(record.timeZone).toBe('America/Chicago');
    expect(record.header).toMatchObject({
      reference: 'V-000042',
      statusLabel: 'Closed — awaiting review',
      pressLine: 'HS-P07, SR-250 (invented model), 250 US tons, sensor generation demo-gen-1',
      siteLine: 'Main plant (invented), 400 Foundry Road (invented)',
      bandSetLine: 'Demo generation 1 (invented), version 1 (invented demo values)',
      technician: { name: 'Dana Okafor (invented)' },
    });
    expect(record.times).toEqual({ labourMinutes: 95, travelMinutes: 40, repairMinutes: 95 });
  });

  it('follows the current answers through the procedure to the finding, with who confirmed each safety gate and when', () => {
    const { path } = buildVisitRecord(source());
    expect(path.steps.map((s) => s.stepId)).toEqual([
      'press-at-rest',
      'firmware-versions',
      'lockout',
      'identify-generation',
      'monitor-jumper',
      'connector-coupling',
      'wiring-conductors',
      'resistance-control-end',
      'resistance-sensor-end',
    ]);
    expect(path.finding?.title).toBe(CRANK_ANGLE_PROCEDURE.definition.steps.find((s) => s.id === 'finding-sensor')!.title);
    const lockout = path.steps.find((s) => s.stepId === 'lockout')!;
    expect(lockout).toMatchObject({ kind: 'safety_gate', answer: 'Locked out and verified dead', confirmedAt: AT(10), confirmedBy: 'Marek Lindqvist (invented)' });
    expect(lockout.confirmations.length).toBeGreaterThan(0);
    expect(path.steps.find((s) => s.stepId === 'identify-generation')!.answer).toBe('Read from the nameplate');
    expect(path.steps.find((s) => s.stepId === 'connector-coupling')!).toMatchObject({ note: 'Ring tight (invented note).', confirmedBy: null });
    expect(path.steps.find((s) => s.stepId === 'firmware-versions')!.details).toHaveLength(2);
  });

  it('keeps the current readings of the path, judged against the pinned band, and counts the replaced ones', () => {
    const { readings } = buildVisitRecord(source());
    expect(readings.items.map((r) => r.id)).toEqual(['r1', 'r2', 'r3', 'r4']);
    expect(readings.replaced).toBe(1);
    // demo-gen-1's invented rotor band: 120 Ω, ±8 % in band, ±15 % near edge, at 20 °C.
    expect(readings.items[0]).toMatchObject({ circuitLabel: 'Rotor R1–R2', positionLabel: 'Control end', entered: 'OL', verdict: 'open', verdictLabel: 'Open circuit', band: '120 Ω ± 8 % at 20 °C (near edge ± 15 %)' });
    // 80 Ω against 55 Ω ± 15 % is beyond the near-edge zone.
    expect(readings.items[1]).toMatchObject({ verdict: 'out_of_band', verdictLabel: 'Out of band', judgedValue: '80 Ω' });
    // R20 = 55 × (234.5 + 20) / (234.5 + 35) = 51.94 Ω: copper's 234.5 constant (IEC 60228 / IEEE Std C57.12.90, from memory of the standards).
    expect(readings.items[2]).toMatchObject({ verdict: 'in_band', judgedValue: '51.94 Ω', temperature: 'Winding at 35 °C; corrected to 20 °C: 51.94 Ω' });
  });

  it('records the press as returned to production with each check in words and the two-hand distance, or nothing before the close-out', () => {
    const { asLeft } = buildVisitRecord(source());
    expect(asLeft).toEqual({
      state: 'returned_to_production',
      headline: 'Press returned to production',
      checks: [
        { key: 'faultCleared', text: RETURN_TO_SERVICE_CHECKS.faultCleared },
        { key: 'tdcAgrees', text: RETURN_TO_SERVICE_CHECKS.tdcAgrees },
        { key: 'crankAngleSettings', text: RETURN_TO_SERVICE_CHECKS.crankAngleSettings },
        { key: 'guardsRefitted', text: RETURN_TO_SERVICE_CHECKS.guardsRefitted },
        { key: 'toolsRemoved', text: RETURN_TO_SERVICE_CHECKS.toolsRemoved },
        { key: 'everyoneClear', text: RETURN_TO_SERVICE_CHECKS.everyoneClear },
        { key: 'singleStroke', text: RETURN_TO_SERVICE_CHECKS.singleStroke },
        { key: 'stoppingTimeChecked', text: RETURN_TO_SERVICE_CHECKS.stoppingTimeChecked },
        { key: 'presenceSensing', text: 'No presence-sensing device is fitted to this press.' },
        { key: 'twoHand', text: 'Every two-hand control station sits at or beyond its safety distance.' },
      ],
      stoppingTimeMs: 180,
      // OSHA 29 CFR 1910.217(c)(3)(vii)(c): Ds = 63 in/s × 0.18 s = 11.34 in → 11.4 in rounded up;
      // 11.34 in × 25.4 mm/in = 288.036 mm → 288.1 mm (worked by hand).
      distances: ['Two-hand control: minimum safety distance 11.4 in (288.1 mm), OSHA 29 CFR 1910.217(c)(3)(vii)(c): Ds = 63 in/s × 0.18 s; rounded up.'],
    });
    const open = source();
    expect(buildVisitRecord({ ...open, visit: { ...open.visit, status: 'in_progress', asLeftState: null, returnToService: null } }).asLeft).toBeNull();
  });

  it('keeps a visit closed before the fuller checks with only the checks it confirmed', () => {
    const src = source();
    const older = { faultCleared: true, tdcAgrees: true, stoppingTimeChecked: true, presenceSensingDistanceOk: 'yes' } as unknown as typeof src.visit.returnToService;
    const asLeft = buildVisitRecord({ ...src, visit: { ...src.visit, returnToService: older } }).asLeft;
    expect(asLeft?.state === 'returned_to_production' && asLeft.checks.map((c) => c.key)).toEqual(['faultCleared', 'tdcAgrees', 'stoppingTimeChecked', 'presenceSensing']);
    // No stopping time stored: no distance can be worked out, so none is claimed.
    expect(asLeft?.state === 'returned_to_production' && asLeft.distances).toEqual([]);
  });

  it('records a press left locked out with what it waits for as the headline, no return-to-service checks and no time to repair', () => {
    const src = source();
    const record = buildVisitRecord({
      ...src,
      visit: { ...src.visit, asLeftState: 'locked_out', returnToService: null, lockedOut: { reason: 'Excitation missing at the board (invented).', waitsFor: 'board' } },
    });
    expect(record.asLeft).toEqual({
      state: 'locked_out',
      headline: 'Press left locked out: not fit for production until the processor board is repaired or replaced',
      reason: 'Excitation missing at the board (invented).',
      waitsFor: 'board',
    });
    expect(record.times.repairMinutes).toBeNull();
    expect(record.times.labourMinutes).toBe(95);
    const other = buildVisitRecord({
      ...src,
      visit: { ...src.visit, asLeftState: 'locked_out', returnToService: null, lockedOut: { reason: 'No spare on site.', waitsFor: 'other', waitsForDetail: 'the plant fits its spare cable. ' } },
    });
    expect(other.asLeft?.headline).toBe('Press left locked out: not fit for production until the plant fits its spare cable');
  });

  it('marks a cancelled visit with who, when and why', () => {
    const src = source();
    const record = buildVisitRecord({ ...src, visit: { ...src.visit, status: 'cancelled', cancellation: { at: AT(30), by: 'Dana Okafor (invented)', reason: 'Started on the wrong press' } } });
    expect(record.header.statusLabel).toBe('Cancelled');
    expect(record.header.cancellation).toEqual({ at: AT(30), by: 'Dana Okafor (invented)', reason: 'Started on the wrong press' });
  });

  it('lists the safety statements of the steps taken once each, always with the return-to-service warning', () => {
    const { safety } = buildVisitRecord(source());
    const texts = safety.map((s) => s.text);
    expect(new Set(texts).size).toBe(texts.length);
    expect(safety.at(-1)).toEqual({ signalWord: RETURN_TO_SERVICE.signalWord, text: RETURN_TO_SERVICE.text, appliedAt: ['Return to service'] });
    expect(safety.some((s) => s.signalWord === 'DANGER' && s.appliedAt.includes(CRANK_ANGLE_PROCEDURE.definition.steps.find((x) => x.id === 'lockout')!.title))).toBe(true);
  });

  it('carries work, parts, photos, the newest signature and the acknowledgement; a second issue is a corrected report', () => {
    const base = source();
    const record = buildVisitRecord({ ...base, issue: { ...base.issue!, number: 2, acknowledgedAt: AT(300), acknowledgedBy: 'Ines Varga (invented)' } });
    expect(record.title).toBe('Corrected service report V-000042');
    expect(record.issue).toMatchObject({ number: 2, corrected: true });
    expect(record.work).toMatchObject({ cause: { category: 'sensor', label: 'Sensor' }, recommendations: null, firmware: { controlFound: '3.4', monitorLeft: '1.9' } });
    expect(record.parts).toEqual(base.parts);
    expect(record.photos).toEqual([{ id: 'a1', caption: 'Sensor connector', stepTitle: CRANK_ANGLE_PROCEDURE.definition.steps.find((s) => s.id === 'connector-coupling')!.title, hasThumb: true }]);
    expect(record.signOff).toEqual({ contactName: 'Ines Varga (invented)', contactEmail: 'ines@plant.example', signedAt: AT(94), signatureId: 's2', acknowledgement: { at: AT(300), by: 'Ines Varga (invented)' } });
  });

  it('says "Not recorded" for a missing cause and leaves the band empty without a band set', () => {
    const base = source();
    const record = buildVisitRecord({ ...base, bandSet: null, issue: null, visit: { ...base.visit, causeCategory: null } });
    expect(record.work.cause).toEqual({ category: null, label: 'Not recorded' });
    expect(record.header.bandSetLine).toBe('None chosen');
    expect(record.readings.items.every((r) => r.band === null)).toBe(true);
    expect(record.issue).toBeNull();
    expect(record.title).toBe('Service report V-000042');
  });
});
