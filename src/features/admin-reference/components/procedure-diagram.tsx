import { useId } from 'react';
import type { ProcedureDiagram as Diagram } from '@shared/schemas/admin-reference';
import { cn } from '@/lib/cn';
import { BOX, placeDiagram, type PlacedEdge, type PlacedNode } from '../lib/diagram-layout';
import { STEP_KIND_LABELS } from '../lib/step-kinds';
import { KIND_FILL, kindOutline } from './diagram-shapes';

const clip = (text: string, max: number) => (text.length > max ? `${text.slice(0, max - 1)}…` : text);

function edgePath(e: PlacedEdge): { d: string; labelX: number; labelY: number } {
  const sx = e.from.x + BOX.width / 2;
  const sy = e.from.y + BOX.height;
  const tx = e.to.x + BOX.width / 2;
  const ty = e.to.y;
  if (e.to.layer > e.from.layer) {
    const my = (sy + ty) / 2;
    return { d: `M${sx},${sy} C${sx},${my} ${tx},${my} ${tx},${ty - 6}`, labelX: sx + (tx - sx) * 0.3, labelY: sy + (ty - sy) * 0.3 };
  }
  // A branch back up (a loop) or sideways: swing out to the right so it does not hide the boxes.
  const out = Math.max(e.from.x, e.to.x) + BOX.width + BOX.gapX / 2;
  return { d: `M${e.from.x + BOX.width},${e.from.y + BOX.height / 2} C${out},${e.from.y} ${out},${e.to.y + BOX.height} ${e.to.x + BOX.width},${e.to.y + BOX.height / 2}`, labelX: out - 10, labelY: (e.from.y + e.to.y) / 2 + BOX.height / 2 };
}

function StepBox({ node, start }: { node: PlacedNode; start: boolean }) {
  const label = node.missing ? node.title : `${STEP_KIND_LABELS[node.kind]}: ${node.title}`;
  return (
    <g data-step-id={node.id} data-kind={node.missing ? 'missing' : node.kind} className={cn('text-ink', node.missing && 'text-verdict-out_of_band')}>
      <title>{`${label} (${node.id})${node.reachable || node.missing ? '' : ' — cannot be reached from the start'}`}</title>
      {kindOutline(node.kind, { x: node.x, y: node.y, w: BOX.width, h: BOX.height }, cn(node.missing ? 'fill-verdict-out_of_band-soft' : KIND_FILL[node.kind], 'stroke-current'))}
      <text x={node.x + BOX.width / 2} y={node.y + 24} textAnchor="middle" className="fill-current text-[13px] font-semibold uppercase tracking-wide">
        {node.missing ? 'Missing step' : `${start ? 'Start · ' : ''}${STEP_KIND_LABELS[node.kind]}`}
      </text>
      <text x={node.x + BOX.width / 2} y={node.y + 48} textAnchor="middle" className="fill-current text-[15px]">
        {clip(node.missing ? node.id : node.title, 26)}
      </text>
      {!node.reachable && !node.missing && (
        <text x={node.x + BOX.width / 2} y={node.y + 66} textAnchor="middle" className="fill-current text-[12px] italic">
          not reachable
        </text>
      )}
    </g>
  );
}

/** The branching of a procedure as a layered diagram: steps by distance from the start, arrows labelled with outcomes. */
export function ProcedureDiagram({ diagram }: { diagram: Diagram }) {
  const titleId = useId();
  const markerId = `${titleId}-arrow`;
  const { nodes, edges, width, height } = placeDiagram(diagram);

  return (
    <figure className="space-y-2">
      <figcaption id={titleId} className="text-lg font-semibold text-ink">
        Branching diagram: {diagram.nodes.length} steps, {diagram.edges.length} outcomes
      </figcaption>
      <div className="overflow-x-auto rounded-lg border border-surface-line bg-surface-raised">
        <svg role="img" aria-labelledby={titleId} viewBox={`0 0 ${width + BOX.width / 2} ${height}`} width={width + BOX.width / 2} height={height} className="block text-ink">
          <defs>
            <marker id={markerId} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="8" markerHeight="8" orient="auto-start-reverse">
              <path d="M0,0 L10,5 L0,10 Z" className="fill-current" />
            </marker>
          </defs>
          {edges.map((e) => {
            const { d, labelX, labelY } = edgePath(e);
            return (
              <g key={`${e.from.id}-${e.to.id}`} data-edge={`${e.from.id}->${e.to.id}`} className={e.missingTarget ? 'text-verdict-out_of_band' : 'text-ink-muted'}>
                <path d={d} className="fill-none stroke-current" strokeWidth={2} strokeDasharray={e.missingTarget ? '6 4' : undefined} markerEnd={`url(#${markerId})`} />
                <text x={labelX} y={labelY} textAnchor="middle" paintOrder="stroke" className="fill-current stroke-surface-raised text-[13px]" strokeWidth={5}>
                  {clip(e.label, 34)}
                </text>
              </g>
            );
          })}
          {nodes.map((n) => (
            <StepBox key={n.id} node={n} start={n.id === diagram.start} />
          ))}
        </svg>
      </div>
      <details className="text-lg text-ink">
        <summary className="min-h-touch cursor-pointer py-2 font-semibold">Steps and branches as a list</summary>
        <ol className="list-decimal space-y-2 pl-6">
          {diagram.nodes.map((n) => (
            <li key={n.id}>
              <span className="font-semibold">{n.title}</span> ({STEP_KIND_LABELS[n.kind]}, {n.id})
              <ul className="list-disc pl-6 text-base">
                {diagram.edges
                  .filter((e) => e.from === n.id)
                  .map((e) => (
                    <li key={`${e.label}-${e.to}`}>
                      {e.label} → {e.missingTarget ? `missing step “${e.to}”` : e.to}
                    </li>
                  ))}
              </ul>
            </li>
          ))}
        </ol>
      </details>
    </figure>
  );
}
