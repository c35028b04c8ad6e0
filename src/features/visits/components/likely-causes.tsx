import type { VisitDetail } from '@shared/schemas/visit-detail';
import { CAUSE_LABELS } from '@shared/schemas/visit';

/** The causes the answers so far point to, most likely first, and those they speak against. */
export function LikelyCauses({ ranking }: { ranking: VisitDetail['likelyCauses'] }) {
  // With no evidence the engine falls back to none_found at score 0: that is "no idea yet", not a finding.
  const nothingYet = ranking.ranked.length === 1 && ranking.ranked[0]!.cause === 'none_found' && ranking.ranked[0]!.score === 0;
  return (
    <section aria-labelledby="likely-causes-heading" className="space-y-3 rounded-lg border border-surface-line bg-surface-raised p-4">
      <h2 id="likely-causes-heading" className="text-xl font-semibold text-ink">
        Likely causes
      </h2>
      {nothingYet ? (
        <p className="text-lg text-ink-muted">Nothing points to a cause yet. The ranking fills in as you answer the steps.</p>
      ) : (
      <ol className="space-y-3">
        {ranking.ranked.map((c, i) => (
          <li key={c.cause}>
            <p className="text-lg font-semibold text-ink">
              {i + 1}. {CAUSE_LABELS[c.cause]}
            </p>
            <ul className="list-disc pl-6 text-base text-ink-muted">
              {c.reasons.map((r) => (
                <li key={r}>{r}</li>
              ))}
            </ul>
          </li>
        ))}
      </ol>
      )}
      {ranking.ruledOut.length > 0 && (
        <div>
          <h3 className="text-lg font-semibold text-ink">Less likely so far</h3>
          <ul className="space-y-2">
            {ranking.ruledOut.map((c) => (
              <li key={c.cause} className="text-base text-ink-muted">
                <span className="font-semibold line-through">{CAUSE_LABELS[c.cause]}</span> — {c.reasons.join(' ')}
              </li>
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}
