import { CRANK_ANGLE_PROCEDURE } from '../data/crank-angle-procedure';
import { traverseProcedure } from './traverse-procedure';

const definition = CRANK_ANGLE_PROCEDURE.definition;
const answer = (stepId: string, outcome: string) => ({ stepId, outcome });
const UP_TO_WINDINGS = [
  answer('press-at-rest', 'confirmed'),
  answer('firmware-versions', 'compatible'),
  answer('lockout', 'confirmed'),
  answer('identify-generation', 'nameplate'),
  answer('monitor-jumper', 'yes'),
  answer('connector-coupling', 'secure'),
  answer('wiring-conductors', 'sound'),
];

describe('traverseProcedure', () => {
  it('starts at the first safety gate and asks for its confirmations', () => {
    const t = traverseProcedure(definition, []);
    expect(t.current?.id).toBe('press-at-rest');
    expect(t.required?.outcomes.map((o) => o.value)).toEqual(['confirmed']);
    expect(t.required?.confirmations.length).toBeGreaterThan(2);
    expect(t.path).toEqual([]);
    expect(t.findings).toEqual([]);
  });

  it('follows the answers and asks for the control-end readings next', () => {
    const t = traverseProcedure(definition, UP_TO_WINDINGS);
    expect(t.path.map((p) => p.stepId)).toEqual(UP_TO_WINDINGS.map((a) => a.stepId));
    expect(t.current?.id).toBe('resistance-control-end');
    expect(t.required?.readings.map((r) => r.circuit)).toEqual(['rotor', 'stator_1', 'stator_2']);
  });

  it('reaches the cable finding when the windings fail at the control end and pass at the sensor end', () => {
    const t = traverseProcedure(definition, [...UP_TO_WINDINGS, answer('resistance-control-end', 'high'), answer('resistance-sensor-end', 'pass')]);
    expect(t.findings.map((f) => f.cause)).toEqual(['cable']);
    expect(t.required).toBeNull();
  });

  it('reaches the board escalation when windings pass and voltages are low', () => {
    const t = traverseProcedure(definition, [
      ...UP_TO_WINDINGS,
      answer('resistance-control-end', 'pass'),
      answer('reconnect-for-live', 'confirmed'),
      answer('ac-voltages', 'low'),
    ]);
    expect(t.findings[0]).toMatchObject({ cause: 'board', escalate: true });
  });

  it('uses the latest answer for a step and lists answers left off the path', () => {
    const t = traverseProcedure(definition, [
      ...UP_TO_WINDINGS,
      answer('resistance-control-end', 'high'),
      answer('resistance-sensor-end', 'pass'),
      answer('resistance-control-end', 'pass'),
    ]);
    expect(t.current?.id).toBe('reconnect-for-live');
    expect(t.unusedAnswers).toEqual([answer('resistance-sensor-end', 'pass')]);
  });

  it('stops at a step whose answer is not one of its outcomes and says so', () => {
    const t = traverseProcedure(definition, [answer('press-at-rest', 'skipped')]);
    expect(t.current?.id).toBe('press-at-rest');
    expect(t.problems).toEqual(['Step "press-at-rest": "skipped" is not one of its outcomes.']);
  });
});
