import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { cancelVisitSchema, type CancelVisitInput } from '@shared/schemas/visit';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { useCancelVisit } from '@/api/visits';
import { applyServerErrors } from '@/lib/apply-server-errors';

/**
 * For a visit started by mistake (wrong press, opened twice): cancelled with a reason, kept for the
 * record and left out of the figures. Two steps, so a stray tap cannot cancel real work.
 */
export function CancelVisit({ visitId }: { visitId: number }) {
  const [asking, setAsking] = useState(false);
  const cancel = useCancelVisit(visitId);
  const form = useForm<CancelVisitInput>({ resolver: zodResolver(cancelVisitSchema), defaultValues: { reason: '' } });
  const submit = form.handleSubmit(async (values) => {
    try {
      await cancel.mutateAsync(values);
    } catch (error) {
      applyServerErrors(form, error);
    }
  });

  if (!asking) {
    return (
      <Button type="button" variant="secondary" onClick={() => setAsking(true)}>
        Cancel this visit…
      </Button>
    );
  }
  return (
    <form onSubmit={submit} noValidate aria-label="Cancel this visit" className="space-y-4 rounded-xl border-2 border-surface-line bg-surface-raised p-5">
      <h2 className="text-xl font-bold text-ink">Cancel this visit</h2>
      <p className="text-lg text-ink">Only for a visit started by mistake. It stays on record, marked cancelled, and is left out of the figures.</p>
      <Field label="Why is it cancelled?" hint="E.g. started on the wrong press, or opened twice." error={form.formState.errors.reason?.message}>
        <TextInput autoComplete="off" {...form.register('reason')} />
      </Field>
      {cancel.isError && !form.formState.errors.reason && (
        <Banner tone="error" role="alert" title="The visit was not cancelled">
          {cancel.error.message}
        </Banner>
      )}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" disabled={cancel.isPending}>
          {cancel.isPending ? 'Cancelling…' : 'Cancel the visit'}
        </Button>
        <Button type="button" variant="secondary" onClick={() => setAsking(false)}>
          Keep working
        </Button>
      </div>
    </form>
  );
}
