import type { ProcedureDefinition, Step } from '../schemas/procedure';
import { energyStatesOnArrival } from './energy-state';
import { indexSteps } from './procedure-graph';

// The energy state a step is reached in decides whether a resistance (locked out) or a voltage
// (live-work precautions in place) measurement may be taken there. Lockout before de-energized work
// follows OSHA 29 CFR 1910.147; the live-work gate is this project's rule for energized tests
// (common practice, no published source).

const gate = (id: string, kind: 'lockout' | 'live_work' | 'press_at_rest' | 'die_area', next: string): Step => ({
  id, kind: 'safety_gate', gate: kind, title: id, instructions: 'x', confirmations: ['Done'], outcomes: [{ value: 'confirmed', label: 'OK', next }],
});
const check = (id: string, yes: string, no: string): Step => ({
  id, kind: 'check', title: id, instructions: 'x', outcomes: [{ value: 'yes', label: 'y', next: yes }, { value: 'no', label: 'n', next: no }],
});
const end: Step = { id: 'end', kind: 'finding', title: 'End', instructions: 'x', cause: 'none_found', conclusion: 'c', recommendedAction: 'a', escalate: false };

const statesOf = (start: string, steps: Step[]) => {
  const definition: ProcedureDefinition = { formatVersion: 1, start, steps };
  return Object.fromEntries([...energyStatesOnArrival(definition, indexSteps(definition))].map(([id, s]) => [id, [...s].sort()]));
};

describe('energyStatesOnArrival', () => {
  it('the start is reached with nothing established; each gate sets the state for the steps after it', () => {
    expect(statesOf('a', [check('a', 'lock', 'lock'), gate('lock', 'lockout', 'live'), gate('live', 'live_work', 'end'), end])).toEqual({
      a: ['not_established'],
      lock: ['not_established'],
      live: ['locked_out'],
      end: ['live_work'],
    });
  });

  it('a press-at-rest or die-area gate and a check step pass the state on unchanged', () => {
    expect(statesOf('lock', [gate('lock', 'lockout', 'rest'), gate('rest', 'press_at_rest', 'die'), gate('die', 'die_area', 'c'), check('c', 'end', 'end'), end])).toEqual({
      lock: ['not_established'],
      rest: ['locked_out'],
      die: ['locked_out'],
      c: ['locked_out'],
      end: ['locked_out'],
    });
  });

  it('a step reached by two paths carries the states of both', () => {
    expect(statesOf('c', [check('c', 'lock', 'end'), gate('lock', 'lockout', 'end'), end]).end).toEqual(['locked_out', 'not_established']);
  });

  it('an unreachable step gets no state at all', () => {
    expect(statesOf('end', [end, gate('stray', 'lockout', 'end')])).toEqual({ end: ['not_established'] });
  });
});
