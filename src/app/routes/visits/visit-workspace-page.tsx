import { useQuery } from '@tanstack/react-query';
import { useCallback } from 'react';
import { useLocation, useParams, useSearchParams } from 'react-router-dom';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { Banner } from '@/components/ui/banner';
import { LoadError } from '@/components/ui/load-error';
import { PageHeader } from '@/components/ui/page-header';
import { Spinner } from '@/components/ui/spinner';
import { PhotoPanel } from '@/features/photos/components/photo-panel';
import { useSessionUser } from '@/features/session/hooks/use-session-user';
import { visitDetailOptions } from '@/api/visits';
import { CancelVisit } from '@/features/visits/components/cancel-visit';
import { CorrectionNote } from '@/features/visits/components/correction-note';
import { LikelyCauses } from '@/features/visits/components/likely-causes';
import { ReportDeliveryNotice } from '@/features/visits/components/report-delivery-notice';
import { ReturnedVisitNote } from '@/features/visits/components/returned-visit-note';
import { StepList } from '@/features/visits/components/step-list';
import { StepPanel } from '@/features/visits/components/steps/step-panel';
import { VisitStatusMark } from '@/features/visits/components/visit-status-mark';
import { findStep, isVisitOpen } from '@/features/visits/lib/step-records';
import { draftKey } from '@/lib/device-drafts';
import { useDocumentTitle } from '@/lib/use-document-title';

/** The step the workspace shows: the one tapped in the list (kept in the address), else the one waiting now. */
function selectedStepId(visit: VisitDetail, asked: string | null): string | null {
  const { path, currentStepId, noLongerApply } = visit.traversal;
  const known = asked !== null && (path.some((p) => p.stepId === asked) || asked === currentStepId || noLongerApply.includes(asked));
  return known ? asked : currentStepId;
}

export function VisitWorkspacePage() {
  const visitId = Number(useParams().id);
  const user = useSessionUser();
  const [params, setParams] = useSearchParams();
  // Arriving from the close-out: the report notice is the first thing to see.
  const justClosed = (useLocation().state as { justClosed?: boolean } | null)?.justClosed === true;
  const visit = useQuery({ ...visitDetailOptions(visitId), enabled: Number.isInteger(visitId) && visitId > 0 });
  useDocumentTitle(visit.data ? `Visit ${visit.data.reference}` : 'Visit');

  // After an answer the server says which step comes next: show it.
  const onAnswered = useCallback(() => setParams((p) => {
    const next = new URLSearchParams(p);
    next.delete('step');
    return next;
  }), [setParams]);

  if (visit.isPending) return <Spinner label="Loading the visit…" />;
  if (visit.isError) return <LoadError error={visit.error} what="the visit" onRetry={() => void visit.refetch()} />;

  const v = visit.data;
  const open = isVisitOpen(v);
  const stepId = selectedStepId(v, params.get('step'));
  const step = stepId ? findStep(v, stepId) : undefined;
  const names = (id: number) => (id === user.id ? `${user.name} (you)` : id === v.technician.id ? v.technician.name : `user #${id}`);

  return (
    <>
      <PageHeader
        title={`${v.press?.assetTag ?? 'Press'} · ${v.reference}`}
        description={
          <>
            Fault as displayed: {v.faultDisplayed} · {v.procedure.title}
          </>
        }
        actions={<VisitStatusMark status={v.status} />}
      />
      {v.status === 'returned' && <ReturnedVisitNote visitId={v.id} />}
      {v.status === 'in_progress' && v.reviewComment && <CorrectionNote comment={v.reviewComment} />}
      {(v.status === 'closed' || v.status === 'approved') && (
        <>
          <ReportDeliveryNotice visitId={v.id} focusOnShow={justClosed} />
          <Banner className="mb-6" title="This visit is closed">
            It is kept as a record and cannot be changed here.
          </Banner>
        </>
      )}
      {v.status === 'cancelled' && (
        <Banner className="mb-6" title="This visit was cancelled">
          {v.cancellation?.reason ? `Reason: ${v.cancellation.reason}. ` : ''}It is kept for the record and left out of the figures.
        </Banner>
      )}
      {v.traversal.problems.length > 0 && (
        <Banner tone="error" className="mb-6" title="The procedure has a problem">
          {v.traversal.problems.join(' ')}
        </Banner>
      )}
      <div className="mt-6 grid gap-6 lg:grid-cols-[18rem_1fr]">
        <aside>
          <StepList visit={v} selectedStepId={stepId} />
        </aside>
        <div className="min-w-0 space-y-8">
          {step ? (
            <StepPanel
              key={step.id}
              visit={v}
              step={step}
              names={names}
              onAnswered={onAnswered}
              readingsDraftKey={draftKey(user.id, v.id, 'readings')}
              renderPhotos={(photoStepId, prompt) => <PhotoPanel visitId={v.id} stepId={photoStepId} prompt={prompt} disabled={!open} />}
            />
          ) : (
            <Banner title="No step is waiting">The procedure has no step to show.</Banner>
          )}
          <LikelyCauses ranking={v.likelyCauses} />
          <PhotoPanel visitId={v.id} stepId={null} prompt="Photos of the visit as a whole: the press, its nameplate, the display." disabled={!open} />
          {open && <CancelVisit visitId={v.id} />}
        </div>
      </div>
    </>
  );
}
