import { zodResolver } from '@hookform/resolvers/zod';
import { FormProvider, useForm, useWatch, type Resolver } from 'react-hook-form';
import { returnToServiceNeeds } from '@shared/domain/return-to-service';
import { closeOutSchemaFor, type CloseOutInput } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { applyServerErrors } from '@/lib/apply-server-errors';
import { useCloseVisit } from '@/api/visits';
import { closeOutErrorMap } from '../utils/close-out-error-map';
import { closeOutDefaults, type CloseOutFields, type CustomerContact } from '../utils/close-out-values';
import { AsLeftSection, LockedOutSection } from './as-left-section';
import { CauseSection, reachedFinding } from './cause-section';
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
}

/** Everything the close-out needs, checked against the same schema the server uses. */
export function CloseOutForm({ visit, contact, onClosed }: CloseOutFormProps) {
  const close = useCloseVisit(visit.id);
  const finding = reachedFinding(visit);
  const needs = returnToServiceNeeds(finding);
  const form = useForm<CloseOutFields, unknown, CloseOutInput>({
    // The form holds both as-left branches (see CloseOutFields); the schema keeps the chosen one.
    resolver: zodResolver(closeOutSchemaFor(needs), { error: closeOutErrorMap }) as unknown as Resolver<CloseOutFields, unknown, CloseOutInput>,
    defaultValues: closeOutDefaults(visit, contact, finding),
  });
  const asLeft = useWatch({ control: form.control, name: 'asLeft' });
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit(async (values) => {
    try {
      onClosed(await close.mutateAsync(values));
    } catch (error) {
      applyServerErrors(form, error);
    }
  });

  const busy = isSubmitting || close.isPending;
  const invalid = Object.keys(errors).length > 0;

  return (
    <FormProvider {...form}>
      <form onSubmit={submit} noValidate aria-label="Close-out" className="space-y-10">
        <CauseSection visit={visit} />
        <WorkSection />
        <PartsSection />
        <TimeFirmwareSection />
        <AsLeftSection />
        {asLeft === 'locked_out' ? <LockedOutSection /> : <ReturnToServiceSection needs={needs} />}
        <ContactSection />
        <div className="space-y-4">
          {close.isError && !busy && <SubmitProblem error={close.error} visitId={visit.id} onRetry={() => void submit()} />}
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
