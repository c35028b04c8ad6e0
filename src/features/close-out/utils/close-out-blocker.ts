import type { VisitDetail } from '@shared/schemas/visit-detail';

export interface CloseOutBlocker {
  title: string;
  message: string;
}

const stepTitle = (visit: VisitDetail, stepId: string | null) =>
  visit.procedure.definition.steps.find((step) => step.id === stepId)?.title ?? null;

/** Why this visit cannot be closed out now, in words that say where to go instead; null when it can. */
export function closeOutBlocker(visit: VisitDetail): CloseOutBlocker | null {
  switch (visit.status) {
    case 'draft':
      return { title: 'This visit has not started yet', message: 'Start the visit and work the procedure to a finding before closing it out.' };
    case 'closed':
    case 'approved':
      return { title: 'This visit is already closed', message: 'A closed visit cannot be changed. Open the visit to see its record.' };
    case 'returned':
      return {
        title: 'This visit was returned for correction',
        message: `${visit.reviewComment ? `The manager asks: “${visit.reviewComment}” ` : ''}Reopen the visit, make the correction, then close it out again.`,
      };
    case 'in_progress':
      break;
  }
  if (visit.traversal.findingIds.length === 0) {
    const waiting = stepTitle(visit, visit.traversal.currentStepId);
    return {
      title: 'No finding reached yet',
      message: `Work the procedure through to a finding before closing.${waiting ? ` It is waiting at “${waiting}”.` : ''}`,
    };
  }
  return null;
}
