import type { ProcedureDefinition, Step } from '../schemas/procedure';
import { findCycle, indexSteps, isFinding, reachableFrom, successors, topologicalOrder } from './procedure-graph';

const check = (id: string, yes: string, no: string): Step => ({ id, kind: 'check', title: id, instructions: 'x', outcomes: [{ value: 'yes', label: 'y', next: yes }, { value: 'no', label: 'n', next: no }] });
const finding = (id: string): Step => ({ id, kind: 'finding', title: id, instructions: 'x', cause: 'none_found', conclusion: 'c', recommendedAction: 'r', escalate: false });
const graph = (...steps: Step[]) => indexSteps({ formatVersion: 1, start: steps[0]!.id, steps } satisfies ProcedureDefinition);

describe('procedure graph helpers', () => {
  it('successors: outcome targets in order without repeats; none for a finding', () => {
    expect(successors(check('a', 'b', 'b'))).toEqual(['b']);
    expect(successors(check('a', 'c', 'b'))).toEqual(['c', 'b']);
    expect(successors(finding('f'))).toEqual([]);
    expect(isFinding(finding('f'))).toBe(true);
    expect(isFinding(check('a', 'b', 'b'))).toBe(false);
  });

  it('reachableFrom includes the start, follows every branch and ignores unknown targets', () => {
    const steps = graph(check('a', 'b', 'c'), check('b', 'f', 'gone'), check('c', 'f', 'f'), finding('f'), finding('lost'));
    expect([...reachableFrom('a', steps)].sort()).toEqual(['a', 'b', 'c', 'f']);
    expect([...reachableFrom('c', steps)].sort()).toEqual(['c', 'f']);
    expect([...reachableFrom('gone', steps)]).toEqual([]);
  });

  it('findCycle: null for a diamond (two paths to one step are not a cycle)', () => {
    expect(findCycle('a', graph(check('a', 'b', 'c'), check('b', 'f', 'f'), check('c', 'b', 'f'), finding('f')))).toBeNull();
  });

  it('findCycle: the closed list of the cycle, starting where it closes', () => {
    expect(findCycle('a', graph(check('a', 'b', 'f'), check('b', 'c', 'f'), check('c', 'b', 'f'), finding('f')))).toEqual(['b', 'c', 'b']);
    expect(findCycle('a', graph(check('a', 'a', 'f'), finding('f')))).toEqual(['a', 'a']);
  });

  it('findCycle also finds a cycle among steps not reachable from the start', () => {
    expect(findCycle('a', graph(check('a', 'f', 'f'), finding('f'), check('x', 'y', 'f'), check('y', 'x', 'f')))).toEqual(['x', 'y', 'x']);
  });

  it('topologicalOrder puts every step after all the steps that lead to it', () => {
    const steps = graph(check('a', 'c', 'b'), check('b', 'c', 'f'), check('c', 'f', 'f'), finding('f'));
    const order = topologicalOrder(steps);
    expect(order).toHaveLength(4);
    const at = (id: string) => order.indexOf(id);
    for (const [id, step] of steps) for (const next of successors(step)) expect(at(id)).toBeLessThan(at(next));
  });
});
