import type { SafetyMessage, Step } from '../schemas/procedure';
import type { EnergyState } from './energy-state';
import { hazardProblems, stepHazards, stepMessages } from './procedure-hazards';

// The hazard words and kinds below are this project's own rules (common practice, no published
// source): work that moves the slide, swaps a unit, handles boards, uses an insulation tester or is
// done with control power on needs a message covering it. Signal words follow ANSI Z535.4 / Z535.6.

const LOCKED = new Set<EnergyState>(['locked_out']);
const LIVE = new Set<EnergyState>(['live_work']);
const START = new Set<EnergyState>(['not_established']);

const check = (instructions: string, extra: Partial<Step> = {}): Step =>
  ({ id: 'c', kind: 'check', title: 'Check', instructions, outcomes: [{ value: 'yes', label: 'y', next: 'f' }, { value: 'no', label: 'n', next: 'f' }], ...extra }) as Step;
const finding = (recommendedAction: string, extra: Partial<Step> = {}): Step =>
  ({ id: 'f', kind: 'finding', title: 'F', instructions: 'Note it.', cause: 'sensor', conclusion: 'c', recommendedAction, escalate: false, ...extra }) as Step;
const measure = (quantity: 'resistance' | 'ac_voltage', position: 'control_end' | 'sensor_end'): Step => ({
  id: 'm', kind: 'measure', title: 'M', instructions: 'Measure.', meterSetting: 'x',
  readings: [{ key: 'r', label: 'R', quantity, circuit: 'rotor', position, band: quantity === 'resistance' ? { kind: 'winding', circuit: 'rotor' } : { kind: 'excitation' } }],
  outcomes: [{ value: 'pass', label: 'p', next: 'f' }],
});
const gate = (kind: 'lockout' | 'live_work' | 'press_at_rest' | 'die_area', confirmations = ['Ready']): Step => ({
  id: 'g', kind: 'safety_gate', gate: kind, title: 'G', instructions: 'Prepare.', confirmations, outcomes: [{ value: 'confirmed', label: 'ok', next: 'f' }],
});
const firmware = (): Step => ({ id: 'fw', kind: 'firmware', title: 'FW', instructions: 'Read the label.', outcomes: [{ value: 'compatible', label: 'c', next: 'f' }] });

const hazardsOf = (step: Step, arriving: ReadonlySet<EnergyState> = LOCKED) => Object.fromEntries(stepHazards(step, arriving));

describe('stepHazards — hazards from the words of the instructions', () => {
  it.each([
    ['Turn the crank to top dead centre.', 'slide_motion'],
    ['Stop the slide at TDC.', 'slide_motion'],
    ['Inch the press to the mark.', 'slide_motion'],
    ['Use inching mode to reach the mark.', 'slide_motion'],
    ['Bar the flywheel by hand.', 'slide_motion'],
    ['Continue barring the flywheel until the mark lines up.', 'slide_motion'],
    ['Replace the sensor.', 'unit_swap'],
    ['When replacing the unit, keep the old one.', 'unit_swap'],
    ['Swap the two boards.', 'unit_swap'],
    ['Try swapping the cable.', 'unit_swap'],
    ['Fit a unit of the same generation.', 'unit_swap'],
    ['Fit a new cable.', 'unit_swap'],
    ['Wear a wrist strap.', 'board_handling'],
    ['Hold the board by its edges.', 'board_handling'],
    ['Hold the boards by their edges.', 'board_handling'],
    ['Keep it in an electrostatic bag.', 'board_handling'],
    ['Avoid static.', 'board_handling'],
    ['Connect the insulation tester.', 'insulation_test'],
    ['Use a megohmmeter at 500 V.', 'insulation_test'],
    ['With control power on, watch the lamp.', 'energized_work'],
    ['Read it with the control powered.', 'energized_work'],
    ['Read it with the control still powered.', 'energized_work'],
  ] as const)('"%s" exposes someone to %s', (instructions, hazard) => {
    expect(Object.keys(hazardsOf(check(instructions)))).toEqual([hazard]);
  });

  it('gives the reason for each inferred hazard', () => {
    expect(hazardsOf(check('Stop at TDC.'))).toEqual({ slide_motion: 'it moves the crank or slide' });
    expect(hazardsOf(check('Replace it.'))).toEqual({ unit_swap: 'it replaces or fits a part' });
    expect(hazardsOf(check('Wear a wrist strap.'))).toEqual({ board_handling: 'it handles boards' });
    expect(hazardsOf(check('Use a megohmmeter.'))).toEqual({ insulation_test: 'it uses an insulation tester' });
    expect(hazardsOf(check('With control power on, look.'))).toEqual({ energized_work: 'it is done with control power on' });
  });

  it.each([
    'Pinch the clip.', // "inch" inside a word
    'The slide has a stop at TDCX.', // not the abbreviation alone
    'The part was replaced last year.', // a past repair, not this step's work
    'Bar code on the label.', // not barring the flywheel
    'Check the main drive is locked out.', // no hazard words
    'Control power off.',
  ])('"%s" adds no hazard', (instructions) => {
    expect(hazardsOf(check(instructions))).toEqual({});
  });

  it('reads the recommended action of a finding, and only the instructions of other steps', () => {
    expect(hazardsOf(finding('Replace the sensor.'))).toEqual({ unit_swap: 'it replaces or fits a part' });
    expect(hazardsOf(check('Look.', { title: 'Replace the sensor' } as Partial<Step>))).toEqual({});
  });
});

describe('stepHazards — hazards from the kind of step and where it sits', () => {
  it('an AC-voltage measurement is energized work; a resistance measurement is not', () => {
    expect(hazardsOf(measure('ac_voltage', 'control_end'))).toEqual({ energized_work: 'it measures on energized circuits' });
    expect(hazardsOf(measure('resistance', 'control_end'))).toEqual({});
  });

  it('a measurement at the sensor end is work at height (at the sensor on the press)', () => {
    expect(hazardsOf(measure('resistance', 'sensor_end'))).toEqual({ working_at_height: 'it is done at the sensor' });
  });

  it('one voltage reading makes a mixed step energized work; one sensor-end reading puts it at the sensor', () => {
    const mixed = measure('resistance', 'control_end') as Extract<Step, { kind: 'measure' }>;
    mixed.readings.push({ key: 'v', label: 'V', quantity: 'ac_voltage', circuit: 'rotor', position: 'sensor_end', band: { kind: 'excitation' } });
    expect(hazardsOf(mixed)).toEqual({ energized_work: 'it measures on energized circuits', working_at_height: 'it is done at the sensor' });
  });

  it('a live-work gate restores power; a lockout, press-at-rest or die-area gate does not', () => {
    expect(hazardsOf(gate('live_work'))).toEqual({ energized_work: 'it restores power for energized work' });
    for (const g of ['lockout', 'press_at_rest', 'die_area'] as const) expect(hazardsOf(gate(g))).toEqual({});
  });

  it('a firmware step is energized work unless every path reaches it locked out', () => {
    expect(hazardsOf(firmware(), LOCKED)).toEqual({});
    expect(hazardsOf(firmware(), START)).toEqual({ energized_work: 'it reads the control with power on' });
    expect(hazardsOf(firmware(), new Set<EnergyState>(['locked_out', 'not_established']))).toEqual({ energized_work: 'it reads the control with power on' });
  });

  it('a finding reached with control power on after the energized test needs re-locking', () => {
    expect(hazardsOf(finding('Watch.'), new Set<EnergyState>(['locked_out', 'live_work']))).toEqual({ relock: 'it is reached with control power on after the energized test' });
    expect(hazardsOf(finding('Watch.'), LOCKED)).toEqual({});
    expect(hazardsOf(check('Look.'), LIVE)).toEqual({});
  });

  it("the author's tag comes first and keeps its reason; inferred hazards add to it", () => {
    const tagged = { ...measure('ac_voltage', 'sensor_end'), hazards: ['energized_work', 'stored_energy'] } as Step;
    expect(hazardsOf(tagged)).toEqual({ energized_work: 'it is tagged so', stored_energy: 'it is tagged so', working_at_height: 'it is done at the sensor' });
  });
});

describe('stepMessages', () => {
  const warn: SafetyMessage = { signalWord: 'WARNING', text: 'w' };
  const notice: SafetyMessage = { signalWord: 'NOTICE', text: 'n' };
  it('lists the first message, then the further cautions; none when the step has neither', () => {
    expect(stepMessages(check('x', { safety: warn, cautions: [notice] } as Partial<Step>))).toEqual([warn, notice]);
    expect(stepMessages(check('x', { cautions: [notice] } as Partial<Step>))).toEqual([notice]);
    expect(stepMessages(check('x', { safety: warn } as Partial<Step>))).toEqual([warn]);
    expect(stepMessages(check('x'))).toEqual([]);
  });
});

describe('hazardProblems', () => {
  const run = (steps: Step[], arriving: Record<string, EnergyState[]> = {}) =>
    hazardProblems(
      { formatVersion: 1, start: steps[0]!.id, steps },
      new Map(Object.entries(arriving).map(([id, s]) => [id, new Set(s)])),
    );

  it('names the signal words allowed and the hazard with its spaces, and why the step has it', () => {
    expect(run([check('Stop at TDC.')], { c: ['locked_out'] })).toEqual([
      { stepId: 'c', message: 'needs a DANGER or WARNING safety message covering slide motion (it moves the crank or slide)' },
    ]);
    expect(run([{ ...check('x'), hazards: ['working_at_height'] } as Step])).toEqual([
      { stepId: 'c', message: 'needs a DANGER or WARNING safety message covering working at height (it is tagged so)' },
    ]);
  });

  it('a message covers a hazard only when it names it and uses an allowed signal word; cautions count too', () => {
    const covering: SafetyMessage = { signalWord: 'WARNING', text: 'w', covers: ['slide_motion'] };
    expect(run([check('Stop at TDC.', { safety: covering } as Partial<Step>)])).toEqual([]);
    expect(run([check('Stop at TDC.', { cautions: [{ signalWord: 'NOTICE', text: 'n' }, covering] } as Partial<Step>)])).toEqual([]);
    expect(run([check('Stop at TDC.', { safety: { ...covering, signalWord: 'CAUTION' } } as Partial<Step>)])).toHaveLength(1);
    expect(run([check('Stop at TDC.', { safety: { ...covering, covers: ['unit_swap'] } } as Partial<Step>)])).toHaveLength(1);
    expect(run([check('Stop at TDC.', { safety: { signalWord: 'DANGER', text: 'd' } } as Partial<Step>)])).toHaveLength(1);
    // Board handling risks the board, not a person: NOTICE and nothing stronger (ANSI Z535.6).
    expect(run([check('Wear a wrist strap.', { safety: { signalWord: 'NOTICE', text: 'n', covers: ['board_handling'] } } as Partial<Step>)])).toEqual([]);
    expect(run([check('Wear a wrist strap.', { safety: { signalWord: 'DANGER', text: 'd', covers: ['board_handling'] } } as Partial<Step>)])).toEqual([
      { stepId: 'c', message: 'needs a NOTICE safety message covering board handling (it handles boards)' },
    ]);
  });

  it.each(['inspect', 'check', 'choice'] as const)('a hands-on %s step reached with control power on needs a lockout gate before it', (kind) => {
    const step = { ...check('Look.'), kind, ...(kind === 'inspect' ? { photoPrompt: 'p' } : {}) } as Step;
    expect(run([step], { c: ['locked_out', 'live_work'] })).toEqual([
      { stepId: 'c', message: 'is hands-on work reached with control power on after the energized test: put a lockout safety gate before it' },
    ]);
    expect(run([step], { c: ['locked_out'] })).toEqual([]);
  });

  it('a measure step reached live is not hands-on work of that kind', () => {
    const volts = { ...measure('ac_voltage', 'control_end'), safety: { signalWord: 'WARNING', text: 'w', covers: ['energized_work'] } } as Step;
    expect(run([volts], { m: ['live_work'] })).toEqual([]);
  });

  it('a live-work gate must confirm that the main drive stays off and locked out, in one sentence', () => {
    const covered = { signalWord: 'DANGER', text: 'd', covers: ['energized_work'] } as SafetyMessage;
    const live = (confirmations: string[]) => ({ ...gate('live_work', confirmations), safety: covered }) as Step;
    const missing = { stepId: 'g', message: 'restores power for energized work without a confirmation that the main drive stays off and locked out' };
    expect(run([live(['Ready', 'The main drive stays off and locked out.'])])).toEqual([]);
    expect(run([live(['MAIN DRIVE LOCKED OUT'])])).toEqual([]);
    expect(run([live(['Ready'])])).toEqual([missing]);
    // Two sentences do not make the confirmation: the lock must be on the main drive itself.
    expect(run([live(['Main drive off. Control cabinet locked out.'])])).toEqual([missing]);
    // Other gates need no such confirmation.
    expect(run([gate('lockout', ['Ready'])])).toEqual([]);
  });
});
