import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { formatDateTime } from '@shared/format/date-time';
import type { VisitRecord } from '@shared/schemas/visit-record';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { errorMessage } from '@/lib/api-error';
import { useAcknowledgeReport } from '@/api/report';

const acknowledgeFormSchema = z.object({ name: z.string().trim().max(120, 'Keep the name under 120 characters') });
type AcknowledgeForm = z.infer<typeof acknowledgeFormSchema>;

/** The contact confirms they received the report; once recorded, the time and name are shown instead. */
export function AcknowledgePanel({ report, token }: { report: VisitRecord; token: string }) {
  const acknowledge = useAcknowledgeReport(token);
  const { register, handleSubmit, formState } = useForm<AcknowledgeForm>({ resolver: zodResolver(acknowledgeFormSchema), defaultValues: { name: report.signOff.contactName ?? '' } });

  if (report.signOff.acknowledgement) {
    const { at, by } = report.signOff.acknowledgement;
    return (
      <Banner tone="info" role="status" title="Receipt acknowledged">
        Acknowledged on {formatDateTime(at, report.timeZone)}
        {by ? ` by ${by}` : ''}.
      </Banner>
    );
  }

  return (
    <form
      noValidate
      className="space-y-4 rounded-lg border-2 border-surface-line bg-surface-raised p-5"
      onSubmit={handleSubmit((values) => acknowledge.mutate(values.name || undefined))}
    >
      <h2 className="text-2xl font-bold text-ink">Acknowledge receipt</h2>
      <p className="text-lg text-ink">Let {report.companyName} know you received this report. Your name is optional; the time is recorded.</p>
      <Field label="Your name (optional)" error={formState.errors.name?.message}>
        <TextInput autoComplete="name" {...register('name')} />
      </Field>
      {acknowledge.isError && (
        <Banner tone="error" role="alert" title="Not recorded yet">
          {errorMessage(acknowledge.error)} Press the button again to retry.
        </Banner>
      )}
      <Button type="submit" size="lg" disabled={acknowledge.isPending}>
        {acknowledge.isPending ? 'Recording…' : 'Acknowledge receipt'}
      </Button>
    </form>
  );
}
