import { procedureSchema, type Step } from '../schemas/procedure';
import { CAUSE_CATEGORIES } from '../schemas/reading';
import { validateProcedure } from '../domain/validate-procedure';
import { CRANK_ANGLE_PROCEDURE } from './crank-angle-procedure';
import { PLANT_RULES_FIRST } from './safety-messages';

const steps = CRANK_ANGLE_PROCEDURE.definition.steps;
const byId = (id: string) => steps.find((s) => s.id === id) as Step;
const safetyText = (id: string) => byId(id).safety?.text ?? '';

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
    expect(byId('monitor-jumper').instructions).toMatch(/follower position.*remove that board/s);
    expect(byId('connector-coupling').instructions).toContain('coupling ring');
    expect(byId('wiring-conductors').instructions).toMatch(/frayed.*clamped on insulation/s);
    expect(byId('ac-voltages')).toMatchObject({ meterSetting: expect.stringContaining('AC volts') });
  });

  // Safety wording per REFERENCES: OSHA 1910.147 lockout, 1910.217(d)(9)(iv) die blocks, NFPA 70E,
  // IEC 61010-1 CAT III, ANSI Z535 signal words.
  it('cites the lockout, die-block, energized-work and meter-category sources in its safety messages', () => {
    expect(safetyText('lockout')).toContain('1910.147');
    expect(byId('lockout').safety?.signalWord).toBe('DANGER');
    expect(safetyText('press-at-rest')).toContain('1910.217(d)(9)(iv)');
    expect(safetyText('reconnect-for-live')).toMatch(/NFPA 70E.*qualified persons.*PPE.*CAT III.*IEC 61010-1.*live-dead-live/s);
  });

  it('ends every safety message by deferring to the plant, codes and licensed practice', () => {
    for (const step of steps) if (step.safety) expect(step.safety.text.endsWith(PLANT_RULES_FIRST)).toBe(true);
  });

  it('names the post-repair checks on every finding', () => {
    for (const step of steps.filter((s) => s.kind === 'finding')) {
      expect(step.safety?.text).toMatch(/fault clears.*top dead centre.*brake-monitor.*presence-sensing device/s);
    }
  });
});
