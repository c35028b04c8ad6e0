/** The manager's return comment, pinned on a reopened visit (workspace and close-out) until it is closed again. */
export function CorrectionNote({ comment }: { comment: string }) {
  return (
    <section aria-label="Returned for correction" className="mb-6 space-y-1 rounded-lg border-l-[6px] border-verdict-near_edge bg-verdict-near_edge-soft p-4 text-lg text-ink">
      <p className="font-semibold">Returned for correction: the manager’s comment</p>
      <p className="whitespace-pre-line">{comment}</p>
      <p className="text-base text-ink-muted">This stays here until you close the visit again. The close-out keeps what you entered last time.</p>
    </section>
  );
}
