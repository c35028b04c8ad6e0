import { Area, CartesianGrid, ComposedChart, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatSi } from '@shared/domain/format-quantity';
import type { PressHistorySeries } from '@shared/schemas/manager-figures';
import type { Verdict } from '@shared/schemas/reading';
import { VerdictMark } from '@/components/ui/verdict-mark';

// Verdict colours of tailwind.config.ts; each point also gets the verdict's own shape, as VerdictMark does.
const VERDICT_COLOUR: Record<Verdict, string> = { in_band: '#1B6E34', near_edge: '#8A5300', out_of_band: '#B3261E', open: '#6A3D9A', short: '#8E1D5C' };

function VerdictDot({ cx, cy, verdict }: { cx?: number; cy?: number; verdict: Verdict | null }) {
  if (cx === undefined || cy === undefined || !Number.isFinite(cy)) return null;
  const fill = verdict ? VERDICT_COLOUR[verdict] : '#48515B';
  if (verdict === 'near_edge') return <path d={`M${cx} ${cy - 8} L${cx + 8} ${cy} L${cx} ${cy + 8} L${cx - 8} ${cy} Z`} fill={fill} />;
  if (verdict === 'out_of_band' || verdict === 'short') return <rect x={cx - 7} y={cy - 7} width={14} height={14} fill={fill} />;
  return <circle cx={cx} cy={cy} r={7} fill={fill} stroke="#fff" strokeWidth={2} />;
}

const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { dateStyle: 'medium' });

/**
 * One reading across the press's visits, drawn against the band each visit was judged by: the
 * darker strip is in band, the lighter strip the near-edge margin, so drift toward an edge shows
 * before the reading fails. The table below holds the same values for screen readers and print.
 */
export function PressHistoryChart({ series }: { series: PressHistorySeries }) {
  const quantity = series.quantity;
  const data = series.points.map((p) => ({
    label: `${p.reference}\n${day(p.startedAt)}`,
    reference: p.reference,
    value: p.judgedValue,
    verdict: p.verdict,
    edge: p.band ? [p.band.edgeLow, p.band.edgeHigh] : null,
    band: p.band ? [p.band.inLow, p.band.inHigh] : null,
    nominal: p.band?.nominal ?? null,
  }));
  const headingId = `history-${series.key.replace(/[^a-z0-9]/gi, '-')}`;
  return (
    <section aria-labelledby={headingId} className="space-y-3 rounded-xl border border-surface-line bg-surface-raised p-5">
      <h2 id={headingId} className="text-xl font-bold text-ink">
        {series.label}
      </h2>
      <div aria-hidden="true" className="h-72">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 8 }} accessibilityLayer={false}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis dataKey="reference" tick={{ fontSize: 14 }} />
            <YAxis tick={{ fontSize: 14 }} domain={['auto', 'auto']} tickFormatter={(v: number) => formatSi(v, quantity)} width={80} />
            <Tooltip formatter={(v) => (typeof v === 'number' ? formatSi(v, quantity) : String(v))} />
            <Area dataKey="edge" name="Near-edge margin" type="stepAfter" fill="#FDF1DC" stroke="#8A5300" strokeDasharray="4 3" isAnimationActive={false} />
            <Area dataKey="band" name="In band" type="stepAfter" fill="#E6F4EA" stroke="#1B6E34" isAnimationActive={false} />
            <Line dataKey="nominal" name="Nominal" type="stepAfter" stroke="#48515B" strokeDasharray="2 4" dot={false} isAnimationActive={false} />
            <Line
              dataKey="value"
              name="Reading"
              stroke="#15191E"
              strokeWidth={2}
              isAnimationActive={false}
              dot={(props: { cx?: number; cy?: number; index?: number }) => <VerdictDot key={props.index} cx={props.cx} cy={props.cy} verdict={data[props.index ?? 0]?.verdict ?? null} />}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-base">
          <caption className="mb-2 text-left text-ink-muted">{series.label}: each visit, the value judged and the band it was judged by</caption>
          <thead className="border-b-2 border-surface-line">
            <tr>
              <th scope="col" className="py-1 pr-3">Visit</th>
              <th scope="col" className="py-1 pr-3">Typed</th>
              <th scope="col" className="py-1 pr-3">Judged value</th>
              <th scope="col" className="py-1 pr-3">In band</th>
              <th scope="col" className="py-1 pr-3">Near-edge limits</th>
              <th scope="col" className="py-1 pr-3">Verdict</th>
            </tr>
          </thead>
          <tbody>
            {series.points.map((p) => (
              <tr key={p.visitId} className="border-b border-surface-line">
                <th scope="row" className="py-1 pr-3 font-semibold">
                  {p.reference} <span className="block font-normal text-ink-muted">{day(p.startedAt)}</span>
                </th>
                <td className="py-1 pr-3 font-mono">{p.entered}</td>
                <td className="py-1 pr-3">{p.judgedValue === null ? (p.isOpen ? 'open (OL)' : '—') : formatSi(p.judgedValue, quantity)}</td>
                <td className="py-1 pr-3">{p.band ? `${formatSi(p.band.inLow, quantity)} – ${formatSi(p.band.inHigh, quantity)}` : '—'}</td>
                <td className="py-1 pr-3">
                  {p.band ? `${formatSi(p.band.edgeLow, quantity)} – ${formatSi(p.band.edgeHigh, quantity)}` : '—'}
                  {p.bandSetLabel && <span className="block text-ink-muted">{p.bandSetLabel}</span>}
                </td>
                <td className="py-1 pr-3">{p.verdict ? <VerdictMark verdict={p.verdict} /> : <span className="text-ink-muted">Not judged</span>}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
