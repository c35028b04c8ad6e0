import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, useWatch, type Resolver } from 'react-hook-form';
import { returnToServiceNeeds } from '@shared/domain/return-to-service';
import { closeOutSchemaFor, type CloseOutInput } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { useEffect, useState } from 'react';
import type { DefaultValues } from 'react-hook-form';
import { RestoredNotice } from '@/components/ui/restored-notice';
import { clearDraft, loadDraft, saveDraft } from '@/lib/device-drafts';
import { useNavigate } from 'react-router-dom';
import { applyServerErrors } from '@/lib/apply-server-errors';
import { isStaleVersion } from '@/lib/api-error';
import { useCloseVisit } from '@/api/visits';
import { closeOutErrorMap } from '../utils/close-out-error-map';
import { closeOutDefaults, type CloseOutFields, type CustomerContact } from '../utils/close-out-values';
import { AsLeftSection, LockedOutSection } from './as-left-section';
import { CauseSection, reachedFinding } from './cause-section';
import { CloseOutConflict } from './close-out-conflict';
import { ContactSection } from './contact-section';
import { PartsSection } from './parts-section';
import { ReturnToServiceSection } from './return-to-service-section';
import { SubmitProblem } from './submit-problem';
import { TimeFirmwareSection } from './time-firmware-section';
import { WorkSection } from './work-section';

interface CloseOutFormProps {
  visit: VisitDetail;
  /** The customer's contact on record, to pre-fill who signs; absent when there is none. */
  contact?: CustomerContact;
  onClosed: (visit: VisitDetail) => void;
  /** Where what is typed is kept on this device until the visit closes (per person and visit). */
  draftKey?: string;
}

/** Everything the close-out needs, checked against the same schema the server uses. */
export function CloseOutForm({ visit, contact, onClosed, draftKey }: CloseOutFormProps) {
  const close = useCloseVisit(visit.id);
  const navigate = useNavigate();
  const finding = reachedFinding(visit);
  const needs = returnToServiceNeeds(finding);
  // The visit as the close-out was opened, to show what another device changed meanwhile.
  const [filledAgainst] = useState(visit);
  const [restored, setRestored] = useState(() => (draftKey ? loadDraft<DefaultValues<CloseOutFields>>(draftKey) : null));
  const form = useForm<CloseOutFields, unknown, CloseOutInput>({
    // The form holds both as-left branches (see CloseOutFields); the schema keeps the chosen one.
    resolver: zodResolver(closeOutSchemaFor(needs), { error: closeOutErrorMap }) as unknown as Resolver<CloseOutFields, unknown, CloseOutInput>,
    defaultValues: restored?.value ?? closeOutDefaults(visit, contact, finding),
  });
  const asLeft = useWatch({ control: form.control, name: 'asLeft' });

  // Every change the person makes is kept on the device (a reset by Discard is not a change).
  const { subscribe } = form;
  useEffect(() => {
    if (!draftKey) return;
    return subscribe({
      formState: { values: true },
      callback: ({ values, name }) => {
        if (name) saveDraft(draftKey, values);
      },
    });
  }, [subscribe, draftKey]);

  const discardDraft = () => {
    if (draftKey) clearDraft(draftKey);
    form.reset(closeOutDefaults(visit, contact, finding));
    setRestored(null);
  };
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit(async (values) => {
    try {
      // The version and finding it was filled against: the server refuses it when either moved on meanwhile.
      const closed = await close.mutateAsync({ ...values, version: visit.version, findingId: visit.traversal.findingIds[0] });
      if (draftKey) clearDraft(draftKey);
      onClosed(closed);
    } catch (error) {
      applyServerErrors(form, error);
    }
  });

  const busy = isSubmitting || close.isPending;
  const invalid = Object.keys(errors).length > 0;

  return (
    <FormProvider {...form}>
      <form onSubmit={submit} noValidate aria-label="Close-out" className="space-y-10">
        {restored && <RestoredNotice savedAt={restored.savedAt} onDiscard={discardDraft} />}
        <CauseSection visit={visit} />
        <WorkSection />
        <PartsSection />
        <TimeFirmwareSection />
        <AsLeftSection />
        {asLeft === 'locked_out' ? <LockedOutSection /> : <ReturnToServiceSection needs={needs} />}
        <ContactSection />
        <div className="space-y-4">
          {close.isError && !busy && isStaleVersion(close.error) && close.variables && (
            <CloseOutConflict
              filledAgainst={filledAgainst}
              now={visit}
              sent={close.variables}
              busy={busy}
              onCloseAnyway={() => void submit()}
              onReview={() => void navigate(`/visits/${visit.id}`)}
            />
          )}
          {close.isError && !busy && !isStaleVersion(close.error) && <SubmitProblem error={close.error} visitId={visit.id} onRetry={() => void submit()} />}
          {invalid && !close.isError && (
            <Banner tone="error" title="Some answers need attention">
              Look for the messages marked ✕ above; each says what to do.
            </Banner>
          )}
          <Button type="submit" size="lg" block disabled={busy}>
            {busy ? 'Closing the visit…' : 'Close the visit'}
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
