import { Field } from '@/components/ui/field';
import { Section } from '@/components/ui/section';
import { Textarea } from '@/components/ui/textarea';
import { useCloseOutForm } from '../hooks/use-close-out-form';
import { emptyAsAbsent } from '../utils/close-out-values';

/** What was done and what the customer should do next. */
export function WorkSection() {
  const { register, errors } = useCloseOutForm();
  return (
    <Section variant="form" title="Work done">
      <Field label="Actions taken" hint="What you repaired, replaced, set or re-tested." error={errors.actionsTaken?.message}>
        <Textarea className="min-h-32" rows={4} {...register('actionsTaken')} />
      </Field>
      <Field label="Recommendations (optional)" hint="What the plant should watch or plan, e.g. a spare sensor on the shelf." error={errors.recommendations?.message}>
        <Textarea className="min-h-32" rows={3} {...register('recommendations', { setValueAs: emptyAsAbsent })} />
      </Field>
    </Section>
  );
}
