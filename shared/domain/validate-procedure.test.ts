import type { ProcedureDefinition, Step } from '../schemas/procedure';
import { validateProcedure } from './validate-procedure';

const WARN = { signalWord: 'WARNING' as const, text: "Energized. The plant's lockout procedure, local codes and licensed practice come first.", covers: ['energized_work' as const] };
const DANGER = { signalWord: 'DANGER' as const, text: "Lock out. The plant's lockout procedure, local codes and licensed practice come first.", covers: ['stored_energy' as const] };
const LIVE = { ...DANGER, covers: ['energized_work' as const] };
const RELOCK = { signalWord: 'WARNING' as const, text: "Switch off control power and lock out again. The plant's lockout procedure, local codes and licensed practice come first.", covers: ['relock' as const] };
const REPAIR = { signalWord: 'DANGER' as const, text: "Repair only locked out. The plant's lockout procedure, local codes and licensed practice come first.", covers: ['unit_swap' as const] };

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
    { id: 'live', kind: 'safety_gate', gate: 'live_work', title: 'Live', instructions: 'Prepare.', safety: LIVE, confirmations: ['Ready', 'The main drive stays off and locked out.'], outcomes: [{ value: 'confirmed', label: 'OK', next: 'volts' }] },
    {
      id: 'volts', kind: 'measure', title: 'Volts', instructions: 'Measure.', meterSetting: 'V~', safety: WARN,
      readings: [{ key: 'e', label: 'Excitation', quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', band: { kind: 'excitation' } }],
      outcomes: [
        { value: 'pass', label: 'Pass', next: 'none' },
        { value: 'excitation_out_of_range', label: 'Drive', next: 'bad-board' },
        { value: 'output_low', label: 'Output low', next: 'bad-board' },
        { value: 'output_high', label: 'Output high', next: 'bad-board' },
      ],
    },
    { id: 'bad-sensor', kind: 'finding', title: 'Sensor', instructions: 'x', cause: 'sensor', conclusion: 'Sensor.', recommendedAction: 'Replace.', escalate: false, safety: REPAIR },
    { id: 'bad-board', kind: 'finding', title: 'Board', instructions: 'x', cause: 'board', conclusion: 'Board.', recommendedAction: 'Escalate.', escalate: true, safety: RELOCK },
    { id: 'none', kind: 'finding', title: 'None', instructions: 'x', cause: 'none_found', conclusion: 'None.', recommendedAction: 'Watch.', escalate: false, safety: RELOCK },
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

  // Cautions wherever the work can hurt: ANSI Z535 signal words (DANGER/WARNING for injury, NOTICE for
  // property damage); OSHA 29 CFR 1910.147(f)(1) for positioning under lockout.
  describe('hazards and their safety messages, for any procedure', () => {
    it('rejects a tagged step without a message covering the hazard', () => {
      const d = edit((x) => { step(x, 'ohms').hazards = ['working_at_height']; });
      expect(messages(d)).toContain('Step "ohms" needs a DANGER or WARNING safety message covering working at height (it is tagged so)');
    });

    it('accepts the tag once a WARNING covers it, and refuses a CAUTION for it', () => {
      const covering = { signalWord: 'WARNING' as const, text: 'Work at height.', covers: ['working_at_height' as const] };
      expect(messages(edit((x) => { step(x, 'ohms').hazards = ['working_at_height']; step(x, 'ohms').cautions = [covering]; }))).toEqual([]);
      const weak = { ...covering, signalWord: 'CAUTION' as const };
      expect(messages(edit((x) => { step(x, 'ohms').hazards = ['working_at_height']; step(x, 'ohms').cautions = [weak]; })).length).toBe(1);
    });

    it('infers a hazard from the words even when the tag is forgotten: top dead centre means slide motion', () => {
      const d = edit((x) => { (x.steps.find((s) => s.id === 'bad-sensor') as { recommendedAction: string }).recommendedAction = 'Replace the sensor and align it to top dead centre.'; });
      expect(messages(d)).toContain('Step "bad-sensor" needs a DANGER or WARNING safety message covering slide motion (it moves the crank or slide)');
    });

    it('infers unit swaps from "replace" and board handling from a wrist strap; board handling wants NOTICE', () => {
      const d = edit((x) => { delete x.steps.find((s) => s.id === 'bad-sensor')!.safety; });
      expect(messages(d)).toContain('Step "bad-sensor" needs a DANGER or WARNING safety message covering unit swap (it replaces or fits a part)');
      const board = edit((x) => { step(x, 'ohms').instructions = 'Remove the board wearing a wrist strap.'; step(x, 'ohms').cautions = [{ ...WARN, covers: ['board_handling'] }]; });
      expect(messages(board)).toContain('Step "ohms" needs a NOTICE safety message covering board handling (it handles boards)');
    });

    it('requires a re-lock message on a finding reached with control power on after the energized test', () => {
      const d = edit((x) => { delete x.steps.find((s) => s.id === 'bad-board')!.safety; });
      expect(messages(d)).toContain('Step "bad-board" needs a DANGER or WARNING safety message covering relock (it is reached with control power on after the energized test)');
    });

    it('refuses hands-on work after the energized test without a new lockout gate', () => {
      const d = edit((x) => {
        step(x, 'volts').outcomes[0]!.next = 'look';
        x.steps.push({ id: 'look', kind: 'inspect', title: 'Look', instructions: 'Look at the coupling.', photoPrompt: 'p', outcomes: [{ value: 'ok', label: 'OK', next: 'none' }] });
      });
      expect(messages(d)).toContain('Step "look" is hands-on work reached with control power on after the energized test: put a lockout safety gate before it');
    });

    it('requires the live-work gate to confirm that the main drive stays locked out', () => {
      const d = edit((x) => { (step(x, 'live') as { confirmations: string[] }).confirmations = ['Ready']; });
      expect(messages(d)).toContain('Step "live" restores power for energized work without a confirmation that the main drive stays off and locked out');
    });

    it('treats a firmware step read before lockout as energized work', () => {
      const d = edit((x) => {
        x.steps.unshift({ id: 'fw', kind: 'firmware', title: 'FW', instructions: 'Read the versions.', outcomes: [
          { value: 'compatible', label: 'c', next: 'lock' }, { value: 'incompatible', label: 'i', next: 'lock' }, { value: 'unknown', label: 'u', next: 'lock' },
        ] });
        x.start = 'fw';
      });
      expect(messages(d)).toContain('Step "fw" needs a DANGER or WARNING safety message covering energized work (it reads the control with power on)');
    });
  });
});

type Measure = Extract<Step, { kind: 'measure' }>;
const measure = (d: ProcedureDefinition, id: string) => step(d, id) as Measure;

describe('validateProcedure — energy state before measurements (safety rules)', () => {
  it.each(['press_at_rest', 'die_area'] as const)('a %s gate does not count as live-work precautions before a voltage step', (gate) => {
    const d = edit((x) => { (step(x, 'live') as Extract<Step, { kind: 'safety_gate' }>).gate = gate; });
    expect(messages(d)).toEqual(['Step "volts" is an energized measurement not preceded, on every path, by a live-work safety gate']);
  });

  it.each(['press_at_rest', 'die_area'] as const)('a %s gate does not count as a lockout before a resistance step', (gate) => {
    const d = edit((x) => { (step(x, 'lock') as Extract<Step, { kind: 'safety_gate' }>).gate = gate; });
    expect(messages(d)).toEqual(['Step "ohms" is a de-energized measurement not preceded, on every path, by a lockout safety gate']);
  });

  it('a gate that establishes nothing (press at rest) keeps the lockout in force for the steps after it', () => {
    const d = edit((x) => {
      x.steps.push({ id: 'rest', kind: 'safety_gate', gate: 'press_at_rest', title: 'Rest', instructions: 'x', safety: DANGER, confirmations: ['At rest'], outcomes: [{ value: 'confirmed', label: 'OK', next: 'ohms' }] });
      step(x, 'lock').outcomes[0]!.next = 'rest';
    });
    expect(validateProcedure(d)).toMatchObject({ ok: true });
  });

  it('a check step in between keeps the lockout in force', () => {
    const d = edit((x) => {
      x.steps.push({ id: 'look', kind: 'check', title: 'Look', instructions: 'x', outcomes: [{ value: 'yes', label: 'y', next: 'ohms' }, { value: 'no', label: 'n', next: 'ohms' }] });
      step(x, 'lock').outcomes[0]!.next = 'look';
    });
    expect(validateProcedure(d)).toMatchObject({ ok: true });
  });

  it('an unreachable step with outcomes is reported as unreachable, not crashed on', () => {
    const d = edit((x) => x.steps.push({ id: 'stray', kind: 'check', title: 'S', instructions: 'x', outcomes: [{ value: 'yes', label: 'y', next: 'none' }, { value: 'no', label: 'n', next: 'none' }] }));
    expect(messages(d)).toEqual(['Step "stray" cannot be reached from the start step "lock"']);
  });

  it('a cycle is reported alone: the energy check runs on acyclic procedures only', () => {
    // With volts (low) → ohms, ohms would also be reached after live work; that is not reported on top of the cycle.
    const d = edit((x) => { step(x, 'volts').outcomes[1]!.next = 'ohms'; });
    expect(messages(d)).toEqual(['Step "ohms" is on a cycle: ohms → live → volts → ohms']);
  });
});

describe('validateProcedure — rules of a single step', () => {
  it('a safety gate must carry a safety message (the schema keeps it optional)', () => {
    const d = edit((x) => { delete step(x, 'lock').safety; });
    expect(messages(d)).toEqual(['Step "lock" is a safety gate without a safety message']);
  });

  it('two outcomes with the same value are refused', () => {
    const d = edit((x) => { step(x, 'ohms').outcomes[1]!.value = 'pass'; });
    expect(messages(d)).toEqual(['Step "ohms" has two outcomes with the same value']);
  });

  it('names the outcomes required and the ones present', () => {
    const d = edit((x) => { step(x, 'volts').outcomes.pop(); });
    expect(messages(d)).toEqual(['Step "volts" must have exactly the outcomes pass, excitation_out_of_range, output_low, output_high (has pass, excitation_out_of_range, output_low)']);
  });

  it('outcomes may come in any order', () => {
    const d = edit((x) => { step(x, 'ohms').outcomes.reverse(); });
    expect(validateProcedure(d)).toMatchObject({ ok: true });
  });

  it('compares outcome values one by one, not as run-together text ("n" and "oyes" are not "no" and "yes")', () => {
    const d = edit((x) => {
      x.steps.push({ id: 'look', kind: 'check', title: 'Look', instructions: 'x', outcomes: [{ value: 'n', label: 'n', next: 'ohms' }, { value: 'oyes', label: 'y', next: 'ohms' }] });
      step(x, 'lock').outcomes[0]!.next = 'look';
    });
    expect(messages(d)).toEqual(['Step "look" must have exactly the outcomes yes, no (has n, oyes)']);
  });

  it('a check needs yes and no, and a firmware step compatible, incompatible and unknown', () => {
    const d = edit((x) => {
      x.steps.push({ id: 'look', kind: 'check', title: 'Look', instructions: 'x', outcomes: [{ value: 'yes', label: 'y', next: 'ohms' }] });
      x.steps.push({ id: 'fw', kind: 'firmware', title: 'FW', instructions: 'x', outcomes: [{ value: 'compatible', label: 'c', next: 'ohms' }, { value: 'unknown', label: 'u', next: 'ohms' }] });
      step(x, 'lock').outcomes[0]!.next = 'look';
      step(x, 'look').outcomes[0]!.next = 'fw';
    });
    expect(messages(d)).toEqual([
      'Step "look" must have exactly the outcomes yes, no (has yes)',
      'Step "fw" must have exactly the outcomes compatible, incompatible, unknown (has compatible, unknown)',
    ]);
  });

  it('a firmware step with its three outcomes and a choice with two options are accepted', () => {
    const d = edit((x) => {
      x.steps.push({ id: 'fw', kind: 'firmware', title: 'FW', instructions: 'x', outcomes: ['compatible', 'incompatible', 'unknown'].map((value) => ({ value, label: value, next: 'pick' })) });
      x.steps.push({ id: 'pick', kind: 'choice', title: 'Pick', instructions: 'x', outcomes: [{ value: 'a', label: 'A', next: 'ohms' }, { value: 'b', label: 'B', next: 'ohms' }] });
      step(x, 'lock').outcomes[0]!.next = 'fw';
    });
    expect(validateProcedure(d)).toMatchObject({ ok: true });
  });

  it('a choice with one option is refused', () => {
    const d = edit((x) => {
      x.steps.push({ id: 'pick', kind: 'choice', title: 'Pick', instructions: 'x', outcomes: [{ value: 'a', label: 'A', next: 'ohms' }] });
      step(x, 'lock').outcomes[0]!.next = 'pick';
    });
    expect(messages(d)).toEqual(['Step "pick" is a choice with fewer than two options']);
  });

  it('a measure step may not mix resistance and AC-voltage readings', () => {
    const d = edit((x) => { measure(x, 'ohms').readings.push({ key: 'e', label: 'E', quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', band: { kind: 'excitation' } }); });
    const found = messages(d);
    expect(found).toContain('Step "ohms" mixes resistance and AC-voltage readings; split it into a de-energized and an energized step');
    // And, being energized now, it needs its WARNING/DANGER message and a live-work gate before it.
    expect(found).toContain('Step "ohms" is an energized measurement without a DANGER or WARNING safety message');
  });

  it('two readings with the same key are refused', () => {
    const d = edit((x) => { measure(x, 'ohms').readings.push({ key: 'r', label: 'S1', quantity: 'resistance', circuit: 'stator_1', position: 'control_end', band: { kind: 'winding', circuit: 'stator_1' } }); });
    expect(messages(d)).toEqual(['Step "ohms" has two readings with the same key']);
  });

  it('accepts each reading with the band of its quantity and circuit', () => {
    const d = edit((x) => {
      measure(x, 'ohms').readings.push({ key: 's1', label: 'S1', quantity: 'resistance', circuit: 'stator_1', position: 'sensor_end', band: { kind: 'winding', circuit: 'stator_1' } });
      // A reading at the sensor end is work at the sensor: the step then needs that caution too.
      step(x, 'ohms').cautions = [{ signalWord: 'WARNING', text: 'Work at height.', covers: ['working_at_height'] }];
      measure(x, 'volts').readings.push({ key: 'v1', label: 'S1', quantity: 'ac_voltage', circuit: 'stator_1', position: 'control_end', band: { kind: 'stator_output' } });
    });
    expect(validateProcedure(d)).toMatchObject({ ok: true });
  });

  it.each([
    ['a winding of another circuit', 'ohms', { key: 'x', label: 'X', quantity: 'resistance', circuit: 'stator_1', position: 'control_end', band: { kind: 'winding', circuit: 'stator_2' } }],
    ['a voltage band on a resistance', 'ohms', { key: 'x', label: 'X', quantity: 'resistance', circuit: 'rotor', position: 'control_end', band: { kind: 'excitation' } }],
    ['the stator band on the rotor (excitation)', 'volts', { key: 'x', label: 'X', quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', band: { kind: 'stator_output' } }],
    ['the excitation band on a stator output', 'volts', { key: 'x', label: 'X', quantity: 'ac_voltage', circuit: 'stator_2', position: 'control_end', band: { kind: 'excitation' } }],
    ['a winding band on a voltage', 'volts', { key: 'x', label: 'X', quantity: 'ac_voltage', circuit: 'stator_1', position: 'control_end', band: { kind: 'winding', circuit: 'stator_1' } }],
  ] as const)('refuses a reading pointing at %s', (_what, id, reading) => {
    const d = edit((x) => { measure(x, id).readings.push(structuredClone(reading) as Measure['readings'][number]); });
    expect(messages(d)).toEqual([`Step "${id}" reading "x" points at a band that does not fit its quantity and circuit`]);
  });

  it('an energized step may carry DANGER as well as WARNING, but not CAUTION (ANSI Z535.4 signal words)', () => {
    // The DANGER message must cover the energized work it warns of (LIVE is DANGER covering energized_work).
    expect(validateProcedure(edit((x) => { step(x, 'volts').safety = LIVE; }))).toMatchObject({ ok: true });
    const caution = edit((x) => { step(x, 'volts').safety = { signalWord: 'CAUTION', text: WARN.text }; });
    // Both rules speak: the step's own signal word, and no message covering its energized work.
    expect(messages(caution)).toEqual([
      'Step "volts" is an energized measurement without a DANGER or WARNING safety message',
      'Step "volts" needs a DANGER or WARNING safety message covering energized work (it measures on energized circuits)',
    ]);
  });

  it('a de-energized measure step needs no safety message of its own (its lockout gate carries it)', () => {
    expect(step(small(), 'ohms').safety).toBeUndefined();
    expect(validateProcedure(small())).toMatchObject({ ok: true });
  });
});

describe('validateProcedure — shape errors', () => {
  it('names a step without an id by its place in the list, and a step that is not an object', () => {
    const d = edit((x) => { delete (x.steps[2] as { id?: string }).id; }) as unknown as { steps: unknown[] };
    d.steps.push(null);
    const found = messages(d);
    expect(found).toContain('Step "#3" has an invalid id: Invalid input: expected string, received undefined');
    expect(found.some((m) => m.startsWith('Step "#8" has an invalid shape: '))).toBe(true);
  });

  it('names the field path inside a step', () => {
    const d = edit((x) => { measure(x, 'ohms').readings[0]!.key = 'Not A Slug'; });
    expect(messages(d)).toEqual(['Step "ohms" has an invalid readings.0.key: use lower-case letters, digits, - and _']);
  });

  it('reports errors outside the steps by their path, and a non-object as the procedure', () => {
    const d = { ...small(), formatVersion: 2 };
    const found = messages(d);
    expect(found).toHaveLength(1);
    expect(found[0]).toMatch(/^formatVersion: /);
    expect(messages(null)).toEqual([expect.stringMatching(/^procedure: /)]);
    expect(messages({ formatVersion: 1, start: 'lock' })).toEqual([expect.stringMatching(/^steps: /)]);
  });

  it('problems of the whole procedure carry no step id; step problems carry theirs', () => {
    const result = validateProcedure(edit((x) => { x.start = 'missing'; }));
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.problems.find((p) => p.message.startsWith('The start step'))?.stepId).toBeNull();
      expect(result.problems.filter((p) => p.stepId !== null).map((p) => p.stepId)).toContain('lock');
    }
  });
});

describe('validateProcedure — exact problem lists (no rule fires where it should not)', () => {
  it('an unreachable measure step is reported as unreachable only: with no path to it, no energy state is claimed', () => {
    const d = edit((x) => x.steps.push({
      id: 'stray-volts', kind: 'measure', title: 'V', instructions: 'Measure.', meterSetting: 'V~', safety: WARN,
      readings: [{ key: 'e', label: 'E', quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', band: { kind: 'excitation' } }],
      outcomes: [
        { value: 'pass', label: 'Pass', next: 'none' },
        { value: 'excitation_out_of_range', label: 'Drive', next: 'none' },
        { value: 'output_low', label: 'Low', next: 'none' },
        { value: 'output_high', label: 'High', next: 'none' },
      ],
    }));
    expect(messages(d)).toEqual(['Step "stray-volts" cannot be reached from the start step "lock"']);
  });

  it('a duplicated step id is reported once, for that id only', () => {
    const d = edit((x) => { x.steps.push(structuredClone(x.steps[6]!)); });
    expect(messages(d).filter((m) => m.endsWith('is defined twice'))).toEqual(['Step "none" is defined twice']);
  });

  it('a step with any voltage reading counts as energized: after the lockout alone it lacks the live-work gate', () => {
    const d = edit((x) => {
      measure(x, 'ohms').readings.push({ key: 'e', label: 'E', quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', band: { kind: 'excitation' } });
    });
    expect(messages(d)).toContain('Step "ohms" is an energized measurement not preceded, on every path, by a live-work safety gate');
    expect(messages(d)).not.toContain('Step "ohms" is a de-energized measurement not preceded, on every path, by a lockout safety gate');
  });

  it('an empty step list is a problem of the procedure, not of a step', () => {
    expect(messages({ formatVersion: 1, start: 'lock', steps: [] })).toEqual([expect.stringMatching(/^steps: /)]);
  });
});
