import { CRANK_ANGLE_PROCEDURE } from '../data/crank-angle-procedure';
import type { ProcedureDefinition, Step } from '../schemas/procedure';
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

  const UP_TO_VOLTAGES = [...UP_TO_WINDINGS, answer('resistance-control-end', 'pass'), answer('reconnect-for-live', 'confirmed')];

  it('reaches the board escalation when the excitation (the board\'s drive) is out of range', () => {
    const t = traverseProcedure(definition, [...UP_TO_VOLTAGES, answer('ac-voltages', 'excitation_out_of_range')]);
    expect(t.findings[0]).toMatchObject({ cause: 'board', escalate: true });
  });

  // Common practice, no published source: with the drive in range, a low output is the sensor
  // (shorted turns barely change DC resistance) or the cable, not the board.
  it('with the excitation in range and the output low, re-locks, checks the cable insulation, then suspects the sensor', () => {
    const low = [...UP_TO_VOLTAGES, answer('ac-voltages', 'output_low')];
    expect(traverseProcedure(definition, low).current?.id).toBe('relock-output-low');
    const sound = traverseProcedure(definition, [...low, answer('relock-output-low', 'confirmed'), answer('cable-insulation-output', 'yes')]);
    expect(sound.findings.map((f) => f.id)).toEqual(['finding-sensor-output']);
    const leaky = traverseProcedure(definition, [...low, answer('relock-output-low', 'confirmed'), answer('cable-insulation-output', 'no')]);
    expect(leaky.findings.map((f) => f.cause)).toEqual(['cable']);
  });

  it('checks the sensor drive and the cable insulation under a new lockout before "no fault found"', () => {
    const pass = [...UP_TO_VOLTAGES, answer('ac-voltages', 'pass')];
    expect(traverseProcedure(definition, pass).current?.id).toBe('relock-after-live');
    const drive = [...pass, answer('relock-after-live', 'confirmed')];
    expect(traverseProcedure(definition, drive).current?.id).toBe('sensor-drive');
    expect(traverseProcedure(definition, [...drive, answer('sensor-drive', 'slipping_or_loose')]).findings.map((f) => f.id)).toEqual(['finding-drive']);
    const none = traverseProcedure(definition, [...drive, answer('sensor-drive', 'sound'), answer('cable-insulation', 'yes')]);
    expect(none.findings.map((f) => f.cause)).toEqual(['none_found']);
  });

  it('stops at an unknown firmware pairing for a decision', () => {
    const start = [answer('press-at-rest', 'confirmed'), answer('firmware-versions', 'unknown')];
    expect(traverseProcedure(definition, start).current?.id).toBe('firmware-unknown');
    expect(traverseProcedure(definition, [...start, answer('firmware-unknown', 'yes')]).current?.id).toBe('lockout');
    expect(traverseProcedure(definition, [...start, answer('firmware-unknown', 'no')]).findings[0]).toMatchObject({ cause: 'firmware', escalate: true });
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

describe('traverseProcedure — broken definitions and what is asked', () => {
  const tiny = (steps: Step[], start = 'a'): ProcedureDefinition => ({ formatVersion: 1, start, steps });
  const check = (id: string, yes: string, no: string): Step => ({ id, kind: 'check', title: id, instructions: 'x', outcomes: [{ value: 'yes', label: 'Yes', next: yes }, { value: 'no', label: 'No', next: no }] });
  const end: Step = { id: 'end', kind: 'finding', title: 'End', instructions: 'x', cause: 'none_found', conclusion: 'c', recommendedAction: 'r', escalate: false };

  it('a missing start step is a problem, with nothing current', () => {
    const t = traverseProcedure(tiny([end], 'nope'), []);
    expect(t).toMatchObject({ current: null, required: null, findings: [], problems: ['The start step "nope" does not exist.'] });
  });

  it('stops on a cycle instead of looping, naming the step reached twice', () => {
    const t = traverseProcedure(tiny([check('a', 'b', 'end'), check('b', 'a', 'end'), end]), [answer('a', 'yes'), answer('b', 'yes')]);
    expect(t.problems).toEqual(['Step "a" is reached twice: the procedure has a cycle.']);
    expect(t.path.map((p) => p.stepId)).toEqual(['a', 'b']);
  });

  it('an outcome going to an unknown step is a problem, and nothing is current', () => {
    const t = traverseProcedure(tiny([check('a', 'gone', 'end'), end]), [answer('a', 'yes')]);
    expect(t).toMatchObject({ current: null, required: null, findings: [] });
    expect(t.problems).toEqual(['Step "a": outcome "yes" goes to unknown step "gone".']);
    expect(t.path).toEqual([{ stepId: 'a', kind: 'check', outcome: 'yes' }]);
  });

  it('asks a check for its outcomes only: no confirmations, readings, inputs or photo', () => {
    const t = traverseProcedure(tiny([check('a', 'end', 'end'), end]), []);
    expect(t.required).toEqual({ stepId: 'a', kind: 'check', outcomes: [{ value: 'yes', label: 'Yes' }, { value: 'no', label: 'No' }], confirmations: [], readings: [], inputs: [], photoPrompt: null });
  });

  it('asks an inspect step for its photo and inputs', () => {
    const inspect: Step = { id: 'a', kind: 'inspect', title: 'Look', instructions: 'x', photoPrompt: 'Photograph the connector.', inputs: [{ key: 'note', label: 'Note', type: 'text', required: false }], outcomes: [{ value: 'ok', label: 'OK', next: 'end' }] };
    const t = traverseProcedure(tiny([inspect, end]), []);
    expect(t.required).toMatchObject({ photoPrompt: 'Photograph the connector.', inputs: [{ key: 'note' }], confirmations: [], readings: [] });
  });

  it('a finding reached is current and listed, with nothing required', () => {
    const t = traverseProcedure(tiny([check('a', 'end', 'end'), end]), [answer('a', 'no')]);
    expect(t).toMatchObject({ current: { id: 'end' }, required: null, findings: [{ id: 'end' }], unusedAnswers: [], problems: [] });
  });
});
