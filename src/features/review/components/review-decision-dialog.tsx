import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useRef, type KeyboardEvent } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { applyServerErrors } from '@/lib/apply-server-errors';
import { keepTabInside } from '@/lib/focus-trap';
import { errorMessage, isApiError } from '@/lib/api-error';
import { Textarea } from '@/components/ui/textarea';
import { useReviewDecision } from '@/api/visit-review';

export type ReviewMode = 'approve' | 'return';

// A returned visit goes back to the technician, who needs to know what to correct; an approval note is optional.
const schemas = {
  return: z.object({
    comment: z.string().trim().min(3, 'Say what the technician should correct, so they know what to do when they reopen the visit').max(2000, 'Keep the comment under 2,000 characters'),
  }),
  approve: z.object({ comment: z.string().trim().max(2000, 'Keep the note under 2,000 characters') }),
};
type FormValues = { comment: string };

const COPY = {
  approve: { title: 'Approve visit', label: 'Note for the record (optional)', submit: 'Approve visit', busy: 'Approving…' },
  return: { title: 'Return visit to the technician', label: 'What should the technician correct?', submit: 'Return to technician', busy: 'Returning…' },
} as const;

interface ReviewDecisionDialogProps {
  visitId: number;
  reference: string;
  mode: ReviewMode;
  onClose: () => void;
  onDone: (visit: VisitDetail) => void;
}

/** Approve, or return with a comment. Modal: focus stays inside, Escape or Cancel closes it. */
export function ReviewDecisionDialog({ visitId, reference, mode, onClose, onDone }: ReviewDecisionDialogProps) {
  const titleId = useId();
  const copy = COPY[mode];
  const decision = useReviewDecision(visitId);
  const { register, handleSubmit, setError, formState } = useForm<FormValues>({ resolver: zodResolver(schemas[mode]), defaultValues: { comment: '' } });
  const { ref: registerRef, ...commentField } = register('comment');
  const commentRef = useRef<HTMLTextAreaElement | null>(null);

  const dialogRef = useRef<HTMLDivElement | null>(null);

  // Focus the comment on open; give focus back to the button that opened the dialog on close.
  useEffect(() => {
    const opener = document.activeElement as HTMLElement | null;
    commentRef.current?.focus();
    return () => opener?.focus();
  }, []);

  const onKeyDown = (event: KeyboardEvent) => {
    if (event.key === 'Escape' && !decision.isPending) onClose();
    keepTabInside(event, dialogRef.current);
  };

  const submit = handleSubmit((values) => {
    const comment = values.comment.trim();
    decision.mutate(
      { decision: mode, comment: comment || undefined },
      {
        onSuccess: onDone,
        onError: (error) => {
          applyServerErrors({ setError }, error, ['comment']);
        },
      },
    );
  });

  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-ink/50 p-4" onKeyDown={onKeyDown}>
      <div ref={dialogRef} role="dialog" aria-modal="true" aria-labelledby={titleId} className="w-full max-w-xl space-y-5 rounded-xl bg-surface-raised p-6 shadow-xl">
        <h2 id={titleId} className="text-2xl font-bold text-ink">
          {copy.title} {reference}
        </h2>
        {mode === 'return' && <p className="text-lg text-ink-muted">The technician sees your comment on the visit and can reopen it to correct the record.</p>}
        <form onSubmit={submit} noValidate className="space-y-5">
          <Field label={copy.label} error={formState.errors.comment?.message}>
            <Textarea
              {...commentField}
              ref={(el) => {
                registerRef(el);
                commentRef.current = el;
              }}
              rows={4}
            />
          </Field>
          {decision.isError && !(isApiError(decision.error) && decision.error.fields.comment) && (
            <Banner tone="error" role="alert" title="The decision was not saved">
              {errorMessage(decision.error)}
            </Banner>
          )}
          <div className="flex flex-wrap justify-end gap-3">
            <Button variant="secondary" onClick={onClose} disabled={decision.isPending}>
              Cancel
            </Button>
            <Button type="submit" disabled={decision.isPending}>
              {decision.isPending ? copy.busy : copy.submit}
            </Button>
          </div>
        </form>
      </div>
    </div>
  );
}
