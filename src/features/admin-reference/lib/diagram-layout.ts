import type { DiagramNode, ProcedureDiagram } from '@shared/schemas/admin-reference';

export const BOX = { width: 210, height: 72, gapX: 36, gapY: 96, margin: 24 } as const;

export interface PlacedNode extends DiagramNode {
  x: number;
  y: number;
  /** A target named by an outcome that is not a step: drawn so the broken branch is visible. */
  missing: boolean;
}

export interface PlacedEdge {
  from: PlacedNode;
  to: PlacedNode;
  /** Outcomes that share this arrow, joined. */
  label: string;
  missingTarget: boolean;
}

/** Turns the server's layers into coordinates: each layer a row, centred, top to bottom. */
export function placeDiagram(diagram: ProcedureDiagram): { nodes: PlacedNode[]; edges: PlacedEdge[]; width: number; height: number } {
  const nodes: PlacedNode[] = diagram.nodes.map((n) => ({ ...n, x: 0, y: 0, missing: false }));
  const byId = new Map(nodes.map((n) => [n.id, n]));
  // Missing targets sit one row below the step that names them.
  for (const e of diagram.edges) {
    if (!e.missingTarget || byId.has(e.to)) continue;
    const from = byId.get(e.from)!;
    const layer = from.layer + 1;
    const node: PlacedNode = { id: e.to, kind: 'check', title: `Missing step “${e.to}”`, layer, index: 0, reachable: false, x: 0, y: 0, missing: true };
    nodes.push(node);
    byId.set(e.to, node);
  }
  const rows = new Map<number, PlacedNode[]>();
  for (const n of nodes) rows.set(n.layer, [...(rows.get(n.layer) ?? []), n]);
  const widest = Math.max(1, ...[...rows.values()].map((r) => r.length));
  const width = BOX.margin * 2 + widest * BOX.width + (widest - 1) * BOX.gapX;
  const layers = Math.max(0, ...rows.keys()) + 1;
  for (const [layer, row] of rows) {
    const rowWidth = row.length * BOX.width + (row.length - 1) * BOX.gapX;
    const left = (width - rowWidth) / 2;
    row.forEach((n, i) => {
      n.x = left + i * (BOX.width + BOX.gapX);
      n.y = BOX.margin + layer * (BOX.height + BOX.gapY);
    });
  }
  const grouped = new Map<string, PlacedEdge>();
  for (const e of diagram.edges) {
    const key = `${e.from}→${e.to}`;
    const existing = grouped.get(key);
    if (existing) existing.label = `${existing.label} / ${e.label}`;
    else grouped.set(key, { from: byId.get(e.from)!, to: byId.get(e.to)!, label: e.label, missingTarget: e.missingTarget });
  }
  return { nodes, edges: [...grouped.values()], width, height: BOX.margin * 2 + layers * BOX.height + (layers - 1) * BOX.gapY };
}
