import { useFormContext } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { Textarea } from '@/components/ui/textarea';
import { emptyAsAbsent, type CloseOutFields } from '../utils/close-out-values';

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
        <Textarea className="min-h-32" rows={4} {...register('actionsTaken')} />
      </Field>
      <Field label="Recommendations (optional)" hint="What the plant should watch or plan, e.g. a spare sensor on the shelf." error={errors.recommendations?.message}>
        <Textarea className="min-h-32" rows={3} {...register('recommendations', { setValueAs: emptyAsAbsent })} />
      </Field>
    </section>
  );
}
