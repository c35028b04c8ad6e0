import type { DiagramEdge, DiagramNode, ProcedureDiagram } from '../../../shared/schemas/admin-reference';
import type { ProcedureDefinition } from '../../../shared/schemas/procedure';
import { indexSteps, successors } from '../../../shared/domain/procedure-graph';

/**
 * Lays the steps out in layers by breadth-first distance from the start, so every arrow from a
 * layer points to the same or a later one except where the graph loops back. Steps the start cannot
 * reach go in one extra layer at the end, where the validator's message about them is easy to match.
 */
export function procedureDiagram(definition: ProcedureDefinition): ProcedureDiagram {
  const steps = indexSteps(definition);
  const depth = new Map<string, number>();
  if (steps.has(definition.start)) depth.set(definition.start, 0);
  const queue = steps.has(definition.start) ? [definition.start] : [];
  while (queue.length > 0) {
    const id = queue.shift()!;
    for (const next of successors(steps.get(id)!)) {
      if (steps.has(next) && !depth.has(next)) {
        depth.set(next, depth.get(id)! + 1);
        queue.push(next);
      }
    }
  }
  const lastReachable = Math.max(-1, ...depth.values());
  const unreachableLayer = lastReachable + 1;
  const perLayer = new Map<number, number>();
  const nodes: DiagramNode[] = [];
  for (const step of steps.values()) {
    const layer = depth.get(step.id) ?? unreachableLayer;
    const index = perLayer.get(layer) ?? 0;
    perLayer.set(layer, index + 1);
    nodes.push({
      id: step.id,
      kind: step.kind,
      title: step.title,
      layer,
      index,
      reachable: depth.has(step.id),
      ...(step.kind === 'finding' ? { cause: step.cause } : {}),
    });
  }
  const edges: DiagramEdge[] = [];
  for (const step of steps.values()) {
    if (step.kind === 'finding') continue;
    for (const outcome of step.outcomes) {
      edges.push({ from: step.id, to: outcome.next, label: outcome.label, missingTarget: !steps.has(outcome.next) });
    }
  }
  return { start: definition.start, layers: Math.max(...perLayer.keys(), 0) + 1, nodes, edges };
}
