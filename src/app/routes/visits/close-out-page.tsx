import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { Banner } from '@/components/ui/banner';
import { LoadError } from '@/components/ui/load-error';
import { Spinner } from '@/components/ui/spinner';
import { customerDetailOptions } from '@/api/customers';
import { visitDetailOptions } from '@/api/visits';
import { CloseOutBlocked } from '@/features/close-out/components/close-out-blocked';
import { CloseOutForm } from '@/features/close-out/components/close-out-form';
import { CloseOutHeader } from '@/features/close-out/components/close-out-header';
import { closeOutBlocker } from '@/features/close-out/utils/close-out-blocker';
import { PhotoPanel } from '@/features/photos/components/photo-panel';
import { CorrectionNote } from '@/features/visits/components/correction-note';
import { useSessionQuery } from '@/features/session/hooks/use-session-user';
import { draftKey } from '@/lib/device-drafts';
import { useDocumentTitle } from '@/lib/use-document-title';

export function CloseOutPage() {
  const params = useParams();
  const visitId = Number(params.id);
  const validId = Number.isInteger(visitId) && visitId > 0;
  const navigate = useNavigate();
  // The page sits behind the sign-in guard; the person names whose draft this is.
  const user = useSessionQuery().data;

  const visit = useQuery({ ...visitDetailOptions(visitId), enabled: validId });
  useDocumentTitle(visit.data ? `Close out ${visit.data.reference}` : 'Close out');
  const blocker = visit.data ? closeOutBlocker(visit.data) : null;
  const customerId = visit.data?.press?.customerId;
  const contact = useQuery({
    ...customerDetailOptions(customerId ?? 0),
    // A missing contact only means typing it; asking again would keep the form waiting.
    retry: false,
    enabled: customerId !== undefined && visit.data !== undefined && !blocker,
  });

  if (!validId) {
    return (
      <Banner tone="error" title="No such visit" action={<Link to="/">Go to my visits</Link>}>
        The address does not name a visit. Open the visit from your list.
      </Banner>
    );
  }
  if (visit.isPending) return <Spinner label="Loading the visit…" />;
  if (visit.isError) return <LoadError error={visit.error} what="the visit" onRetry={() => void visit.refetch()} />;

  const detail = visit.data;
  // The contact only pre-fills two fields: when it cannot be loaded they are typed instead.
  const waitingForContact = (customerId !== undefined && !blocker && contact.isPending) || !user;

  return (
    <>
      <CloseOutHeader visit={detail} />
      {detail.status === 'in_progress' && detail.reviewComment && <CorrectionNote comment={detail.reviewComment} />}
      {blocker && <CloseOutBlocked blocker={blocker} visitId={detail.id} />}
      {!blocker && waitingForContact && <Spinner label="Loading the customer’s contact…" />}
      {!blocker && !waitingForContact && (
        <div className="space-y-10">
          <PhotoPanel visitId={detail.id} stepId={null} prompt="Photograph the repair, the parts you took out and the control as you left it." />
          <CloseOutForm
            visit={detail}
            contact={contact.data}
            draftKey={user ? draftKey(user.id, detail.id, 'close-out') : undefined}
            onClosed={(closed) => void navigate(`/visits/${closed.id}`, { state: { justClosed: true } })}
          />
        </div>
      )}
    </>
  );
}
