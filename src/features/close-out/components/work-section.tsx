import { useFormContext } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { cn } from '@/lib/cn';
import { emptyAsAbsent, type CloseOutFields } from '../utils/close-out-values';

export const textAreaClass = cn(
  'block min-h-32 w-full rounded-lg border-2 border-surface-edge bg-surface-raised px-4 py-3 text-lg text-ink',
  'focus:border-accent focus:outline-none focus:ring-[3px] focus:ring-accent/40 aria-[invalid=true]:border-verdict-out_of_band',
);

/** What was done and what the customer should do next. */
export function WorkSection() {
  const {
    register,
    formState: { errors },
  } = useFormContext<CloseOutFields>();
  return (
    <section aria-labelledby="close-out-work" className="space-y-4">
      <h2 id="close-out-work" className="text-2xl font-bold text-ink">
        Work done
      </h2>
      <Field label="Actions taken" hint="What you repaired, replaced, set or re-tested." error={errors.actionsTaken?.message}>
        <textarea className={textAreaClass} rows={4} {...register('actionsTaken')} />
      </Field>
      <Field label="Recommendations (optional)" hint="What the plant should watch or plan, e.g. a spare sensor on the shelf." error={errors.recommendations?.message}>
        <textarea className={textAreaClass} rows={3} {...register('recommendations', { setValueAs: emptyAsAbsent })} />
      </Field>
    </section>
  );
}
