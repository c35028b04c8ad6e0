import { procedureSchema, type Step } from '../schemas/procedure';
import { CAUSE_CATEGORIES } from '../schemas/reading';
import { validateProcedure } from '../domain/validate-procedure';
import { CRANK_ANGLE_PROCEDURE } from './crank-angle-procedure';
import { PLANT_RULES_FIRST, RETURN_TO_SERVICE } from './safety-messages';

const steps = CRANK_ANGLE_PROCEDURE.definition.steps;
const byId = (id: string) => steps.find((s) => s.id === id) as Step;
const safetyText = (id: string) => byId(id).safety?.text ?? '';
const allMessages = (step: Step) => [...(step.safety ? [step.safety] : []), ...(step.cautions ?? [])];
const covering = (id: string, hazard: string) => allMessages(byId(id)).find((m) => m.covers?.some((c) => c === hazard));

describe('the crank-angle sensor circuit procedure', () => {
  it('fits the stored shape and passes every validator rule', () => {
    expect(procedureSchema.safeParse(CRANK_ANGLE_PROCEDURE).success).toBe(true);
    const result = validateProcedure(CRANK_ANGLE_PROCEDURE.definition);
    expect(result.ok ? [] : result.problems).toEqual([]);
  });

  it('has a finding for every cause category, and the board finding escalates', () => {
    const causes = new Set(steps.filter((s) => s.kind === 'finding').map((s) => (s.kind === 'finding' ? s.cause : null)));
    expect([...causes].sort()).toEqual([...CAUSE_CATEGORIES].sort());
    expect(byId('finding-board')).toMatchObject({ escalate: true, title: 'Escalate: processor board suspected' });
  });

  it('covers generation, jumper, connector, wiring, firmware, both resistance ends and the voltages', () => {
    const kinds = steps.map((s) => s.kind);
    for (const kind of ['safety_gate', 'check', 'choice', 'measure', 'firmware', 'inspect', 'finding']) expect(kinds).toContain(kind);
    expect(byId('monitor-jumper').instructions).toMatch(/role setting, by jumper, switch or parameter, per the control maker's manual/);
    expect(byId('firmware-versions').instructions).toContain('the press control and its monitoring unit (or whatever pair of units the control has)');
    expect(byId('connector-coupling').instructions).toContain('coupling ring');
    expect(byId('wiring-conductors').instructions).toMatch(/frayed.*clamped on insulation/s);
    expect(byId('ac-voltages')).toMatchObject({ meterSetting: expect.stringMatching(/True-RMS AC volts.*bandwidth.*excitation frequency/) });
    expect(byId('resistance-control-end')).toMatchObject({ meterSetting: expect.stringContaining('REL (zero)') });
  });

  // Safety wording per REFERENCES: OSHA 1910.147 lockout, 1910.217(d)(9)(iv) die blocks, NFPA 70E,
  // IEC 61010-1 CAT III, ANSI Z535 signal words.
  it('cites the lockout, die-block, energized-work and meter-category sources in its safety messages', () => {
    expect(safetyText('lockout')).toContain('1910.147');
    expect(byId('lockout').safety?.signalWord).toBe('DANGER');
    expect(safetyText('press-at-rest')).toContain('1910.217(d)(9)(iv)');
    expect(safetyText('reconnect-for-live')).toMatch(/NFPA 70E.*qualified persons.*PPE.*CAT III.*IEC 61010-1 with IEC 61010-2-030.*known live source before and after/s);
    expect(safetyText('reconnect-for-live')).toMatch(/Only control power is on: the main drive motor stays off and locked out, the flywheel at rest/);
  });

  // The cautions a field review asked for; the sources are named in the message texts.
  it('carries a caution wherever the work can hurt', () => {
    expect(covering('firmware-versions', 'energized_work')).toMatchObject({ signalWord: 'WARNING', text: expect.stringContaining('doors closed') });
    for (const id of ['connector-coupling', 'resistance-sensor-end', 'sensor-drive', 'cable-insulation']) {
      expect(covering(id, 'working_at_height')?.text).toMatch(/fall protection/);
    }
    for (const id of ['finding-sensor', 'finding-drive', 'finding-sensor-output']) {
      expect(covering(id, 'slide_motion')?.text).toMatch(/OSHA 29 CFR 1910\.147\(f\)\(1\).*re-apply locks/s);
    }
    expect(covering('finding-firmware', 'unit_swap')).toMatchObject({ signalWord: 'DANGER', text: expect.stringMatching(/locked and tagged out.*maker's validation.*stopping-time and brake-monitor/s) });
    expect(covering('finding-board', 'relock')?.text).toMatch(/switch off control power and re-apply your lock/);
    expect(byId('finding-board')).toMatchObject({ recommendedAction: expect.stringMatching(/^Switch off control power and re-apply your lock and tag/) });
    expect(covering('finding-none-found', 'energized_work')?.text).toMatch(/main drive motor stays off and locked out/);
    expect(byId('finding-none-found')).toMatchObject({ recommendedAction: expect.stringContaining('only control power on (the main drive motor off and locked out, the flywheel at rest)') });
    expect(covering('monitor-jumper', 'board_handling')).toMatchObject({ signalWord: 'NOTICE' });
    expect(covering('cable-insulation', 'insulation_test')?.text).toMatch(/BOTH ends disconnected, never on a cable still connected to the sensor or the control/);
  });

  it('ends every safety message by deferring to the plant, codes and licensed practice', () => {
    for (const step of steps) for (const m of allMessages(step)) expect(m.text.endsWith(PLANT_RULES_FIRST)).toBe(true);
  });

  it('names the post-repair checks on every finding', () => {
    for (const step of steps.filter((s) => s.kind === 'finding')) {
      expect(allMessages(step)).toContainEqual(RETURN_TO_SERVICE);
      expect(RETURN_TO_SERVICE.text).toMatch(/fault clears.*top dead centre.*brake-monitor.*presence-sensing device/s);
    }
  });
});
