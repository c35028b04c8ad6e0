import type { CloseOutInput } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { CAUSE_LABELS } from '@shared/schemas/visit';
import { ConflictDialog } from '@/components/ui/conflict-dialog';

interface CloseOutConflictProps {
  /** The visit as it was when this close-out was filled. */
  filledAgainst: VisitDetail;
  /** The visit as the server holds it now. */
  now: VisitDetail;
  sent: CloseOutInput;
  busy: boolean;
  onCloseAnyway: () => void;
  onReview: () => void;
}

const stepTitle = (visit: VisitDetail, stepId: string) => visit.procedure.definition.steps.find((s) => s.id === stepId)?.title ?? stepId;

/** The answers and readings saved on the server since the close-out was filled, in words. */
export function changesSince(before: VisitDetail, now: VisitDetail): string[] {
  const knownResults = new Set(before.stepResults.map((r) => r.id));
  const knownReadings = new Set(before.readings.map((r) => r.id));
  return [
    ...now.stepResults.filter((r) => !knownResults.has(r.id) && r.supersededAt === null).map((r) => `“${stepTitle(now, r.stepId)}” answered again`),
    ...now.readings
      .filter((r) => !knownReadings.has(r.id) && r.supersededAt === null)
      .map((r) => `${stepTitle(now, r.stepId)}: ${r.circuit.replace('_', ' ')} now reads ${r.entered}`),
  ];
}

/**
 * The visit changed on another tab or device while this close-out was being filled. Shows what the
 * close-out says beside what changed on the server; closing sends it again against the visit as it is now.
 */
export function CloseOutConflict({ filledAgainst, now, sent, busy, onCloseAnyway, onReview }: CloseOutConflictProps) {
  const changes = changesSince(filledAgainst, now);
  const finding = now.traversal.findingIds[0];
  return (
    <ConflictDialog
      title="The visit changed while you filled this close-out"
      explanation={
        <p>
          Someone saved work on this visit from another tab or device after you opened the close-out. The visit is not closed yet. Check what changed: close it
          with what you typed, or go back to the visit first (what you typed is kept on this device).
        </p>
      }
      yours={
        <>
          <p>
            <span className="font-semibold">Cause: </span>
            {CAUSE_LABELS[sent.causeCategory]}
          </p>
          <p className="line-clamp-3">
            <span className="font-semibold">Actions: </span>
            {sent.actionsTaken}
          </p>
          <p>
            {sent.parts.length} part{sent.parts.length === 1 ? '' : 's'}, signed by {sent.contactName}
          </p>
        </>
      }
      theirs={
        <>
          {finding && (
            <p>
              <span className="font-semibold">Finding: </span>
              {stepTitle(now, finding)}
            </p>
          )}
          {changes.length > 0 ? (
            <ul className="list-disc pl-6">
              {changes.map((c) => (
                <li key={c}>{c}</li>
              ))}
            </ul>
          ) : (
            <p>The visit was changed (its status or review), not its answers or readings.</p>
          )}
        </>
      }
      keepMineLabel="Close with what I typed"
      takeTheirsLabel="Review the visit first"
      busy={busy}
      onKeepMine={onCloseAnyway}
      onTakeTheirs={onReview}
    />
  );
}
