import type { ProcedureDefinition, Step } from '../schemas/procedure';
import { validateProcedure } from './validate-procedure';

const WARN = { signalWord: 'WARNING' as const, text: "Energized. The plant's lockout procedure, local codes and licensed practice come first." };
const DANGER = { signalWord: 'DANGER' as const, text: "Lock out. The plant's lockout procedure, local codes and licensed practice come first." };

/** A small valid procedure: lockout → resistance → live work → voltages → findings. */
function small(): ProcedureDefinition {
  const steps: Step[] = [
    { id: 'lock', kind: 'safety_gate', gate: 'lockout', title: 'Lock out', instructions: 'Lock out.', safety: DANGER, confirmations: ['Locked'], outcomes: [{ value: 'confirmed', label: 'OK', next: 'ohms' }] },
    {
      id: 'ohms', kind: 'measure', title: 'Ohms', instructions: 'Measure.', meterSetting: 'Ω',
      readings: [{ key: 'r', label: 'Rotor', quantity: 'resistance', circuit: 'rotor', position: 'control_end', band: { kind: 'winding', circuit: 'rotor' } }],
      outcomes: [
        { value: 'pass', label: 'Pass', next: 'live' },
        { value: 'imbalance', label: 'Imbalance', next: 'bad-sensor' },
        { value: 'low', label: 'Low', next: 'bad-sensor' },
        { value: 'high', label: 'High', next: 'bad-sensor' },
      ],
    },
    { id: 'live', kind: 'safety_gate', gate: 'live_work', title: 'Live', instructions: 'Prepare.', safety: DANGER, confirmations: ['Ready'], outcomes: [{ value: 'confirmed', label: 'OK', next: 'volts' }] },
    {
      id: 'volts', kind: 'measure', title: 'Volts', instructions: 'Measure.', meterSetting: 'V~', safety: WARN,
      readings: [{ key: 'e', label: 'Excitation', quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', band: { kind: 'excitation' } }],
      outcomes: [
        { value: 'pass', label: 'Pass', next: 'none' },
        { value: 'low', label: 'Low', next: 'bad-board' },
        { value: 'high', label: 'High', next: 'bad-board' },
      ],
    },
    { id: 'bad-sensor', kind: 'finding', title: 'Sensor', instructions: 'x', cause: 'sensor', conclusion: 'Sensor.', recommendedAction: 'Replace.', escalate: false },
    { id: 'bad-board', kind: 'finding', title: 'Board', instructions: 'x', cause: 'board', conclusion: 'Board.', recommendedAction: 'Escalate.', escalate: true },
    { id: 'none', kind: 'finding', title: 'None', instructions: 'x', cause: 'none_found', conclusion: 'None.', recommendedAction: 'Watch.', escalate: false },
  ];
  return { formatVersion: 1, start: 'lock', steps };
}

const edit = (change: (d: ProcedureDefinition) => void): ProcedureDefinition => {
  const d = structuredClone(small());
  change(d);
  return d;
};
const step = (d: ProcedureDefinition, id: string) => d.steps.find((s) => s.id === id) as Extract<Step, { outcomes: unknown }>;
const messages = (d: unknown) => {
  const result = validateProcedure(d);
  return result.ok ? [] : result.problems.map((p) => p.message);
};

describe('validateProcedure', () => {
  it('accepts a well-formed procedure', () => {
    expect(validateProcedure(small())).toMatchObject({ ok: true });
  });

  it('rejects an outcome that goes to an unknown step, naming the step', () => {
    const d = edit((x) => { step(x, 'ohms').outcomes[1]!.next = 'nowhere'; });
    expect(messages(d)).toContain('Step "ohms" has outcome "imbalance" going to unknown step "nowhere"');
  });

  it('rejects an unreachable step', () => {
    const d = edit((x) => x.steps.push({ id: 'orphan', kind: 'finding', title: 'O', instructions: 'x', cause: 'cable', conclusion: 'c', recommendedAction: 'a', escalate: false }));
    expect(messages(d)).toContain('Step "orphan" cannot be reached from the start step "lock"');
  });

  it('rejects a cycle, naming the steps on it', () => {
    const d = edit((x) => { step(x, 'volts').outcomes[0]!.next = 'live'; });
    expect(messages(d).some((m) => m.includes('is on a cycle: live → volts → live') || m.includes('volts → live → volts'))).toBe(true);
  });

  it('rejects a step from which no finding can be reached', () => {
    const d = edit((x) => {
      x.steps.push({ id: 'loop-a', kind: 'check', title: 'A', instructions: 'x', outcomes: [{ value: 'yes', label: 'y', next: 'loop-b' }, { value: 'no', label: 'n', next: 'loop-b' }] });
      x.steps.push({ id: 'loop-b', kind: 'check', title: 'B', instructions: 'x', outcomes: [{ value: 'yes', label: 'y', next: 'loop-a' }, { value: 'no', label: 'n', next: 'loop-a' }] });
      step(x, 'volts').outcomes[0]!.next = 'loop-a';
    });
    expect(messages(d)).toContain('Step "loop-a" leads to no finding');
  });

  it('rejects a measure step reading without a band', () => {
    const d = edit((x) => { delete (step(x, 'ohms') as Extract<Step, { kind: 'measure' }>).readings[0]!.band; });
    expect(messages(d)).toContain('Step "ohms" reading "r" has no band to be judged against');
  });

  it('rejects a de-energized measurement not preceded by a lockout gate', () => {
    const d = edit((x) => { x.start = 'ohms'; step(x, 'lock').outcomes[0]!.next = 'ohms'; x.steps = x.steps.filter((s) => s.id !== 'lock'); });
    expect(messages(d)).toContain('Step "ohms" is a de-energized measurement not preceded, on every path, by a lockout safety gate');
  });

  it('rejects a resistance step reachable by one path that skips the lockout', () => {
    const d = edit((x) => {
      x.steps.unshift({ id: 'fork', kind: 'check', title: 'Fork', instructions: 'x', outcomes: [{ value: 'yes', label: 'y', next: 'lock' }, { value: 'no', label: 'n', next: 'ohms' }] });
      x.start = 'fork';
    });
    expect(messages(d)).toContain('Step "ohms" is a de-energized measurement not preceded, on every path, by a lockout safety gate');
  });

  it('rejects an energized measurement not preceded by a live-work gate', () => {
    const d = edit((x) => { step(x, 'ohms').outcomes[0]!.next = 'volts'; x.steps = x.steps.filter((s) => s.id !== 'live'); });
    expect(messages(d)).toContain('Step "volts" is an energized measurement not preceded, on every path, by a live-work safety gate');
  });

  it('rejects a resistance measurement after live work without a new lockout', () => {
    const d = edit((x) => {
      step(x, 'volts').outcomes[0]!.next = 'ohms-again';
      x.steps.push({ ...structuredClone(step(x, 'ohms')), id: 'ohms-again' } as Step);
      (step(x, 'ohms-again')).outcomes.forEach((o) => { o.next = 'none'; });
    });
    expect(messages(d)).toContain('Step "ohms-again" is a de-energized measurement not preceded, on every path, by a lockout safety gate');
  });

  it('rejects a measure step missing one of its outcomes', () => {
    const d = edit((x) => { step(x, 'ohms').outcomes.pop(); });
    expect(messages(d).some((m) => m.startsWith('Step "ohms" must have exactly the outcomes pass, imbalance, low, high'))).toBe(true);
  });

  it('rejects a safety gate that could be skipped (an outcome other than confirmed)', () => {
    const d = edit((x) => { step(x, 'lock').outcomes.push({ value: 'skip', label: 'Skip', next: 'ohms' }); });
    expect(messages(d).some((m) => m.startsWith('Step "lock" must have exactly the outcomes confirmed'))).toBe(true);
  });

  it('rejects an energized measurement without a DANGER or WARNING message', () => {
    const d = edit((x) => { delete step(x, 'volts').safety; });
    expect(messages(d)).toContain('Step "volts" is an energized measurement without a DANGER or WARNING safety message');
  });

  it('names the step in shape errors too', () => {
    const d = edit((x) => { (step(x, 'ohms') as { title: string }).title = ''; });
    expect(messages(d).some((m) => m.startsWith('Step "ohms" has an invalid title'))).toBe(true);
  });

  it('rejects duplicate step ids and a missing start step', () => {
    const d = edit((x) => { x.steps.push(structuredClone(x.steps[6]!)); x.start = 'missing'; });
    const found = messages(d);
    expect(found).toContain('Step "none" is defined twice');
    expect(found).toContain('The start step "missing" does not exist.');
  });
});
