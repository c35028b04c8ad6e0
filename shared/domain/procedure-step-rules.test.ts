import type { Step } from '../schemas/procedure';
import { stepProblems } from './procedure-step-rules';

describe('stepProblems — a step on its own', () => {
  it('a measure step without readings (the schema refuses it first) is judged by the resistance outcomes, not crashed on', () => {
    const bare = {
      id: 'm', kind: 'measure', title: 'M', instructions: 'x', meterSetting: 'Ω', readings: [],
      outcomes: ['pass', 'imbalance', 'low', 'high'].map((value) => ({ value, label: value, next: 'f' })),
    } as Step;
    expect(stepProblems(bare)).toEqual([]);
  });

  it('a finding has no step rules of its own', () => {
    expect(stepProblems({ id: 'f', kind: 'finding', title: 'F', instructions: 'x', cause: 'sensor', conclusion: 'c', recommendedAction: 'a', escalate: false })).toEqual([]);
  });
});
