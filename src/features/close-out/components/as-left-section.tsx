import { useWatch } from 'react-hook-form';
import { WAITS_FOR_CHOICES } from '@shared/record/record-wording';
import { Field } from '@/components/ui/field';
import { RadioCards } from '@/components/ui/radio-cards';
import { SafetyNotice } from '@/components/ui/safety-notice';
import { Textarea } from '@/components/ui/textarea';
import { TextInput } from '@/components/ui/text-input';
import { Section } from '@/components/ui/section';
import { useCloseOutForm } from '../hooks/use-close-out-form';
import { emptyAsAbsent } from '../utils/close-out-values';

/** How the press is left: back in production, or locked out and tagged until it can be repaired. */
export function AsLeftSection() {
  const { register, errors } = useCloseOutForm();
  return (
    <Section variant="form" title="How the press is left">
      <RadioCards
        legend="The press is"
        hint="Choose “left locked out” when the press cannot run production yet, for example while it waits for a board or a part."
        options={[
          { value: 'returned_to_production', label: 'Returned to production', detail: 'After the return-to-service checks below.' },
          { value: 'locked_out', label: 'Left locked out, tagged not fit for production', detail: 'Say why and what it waits for.' },
        ]}
        error={errors.asLeft?.message}
        registration={register('asLeft')}
      />
    </Section>
  );
}

/** Why the press stays out of production and what it waits for; no return-to-service checks apply yet. */
export function LockedOutSection() {
  const { register, control, errors } = useCloseOutForm();
  const waitsFor = useWatch({ control, name: 'lockedOut.waitsFor' });
  const e = errors.lockedOut;
  return (
    <Section variant="form" title="Left locked out">
      <SafetyNotice level="warning">
        Switch off control power and re-apply your lock and tag under the plant’s lockout procedure, and tag the press not fit for production
        before you leave it. Tell the plant’s responsible person that the press must not run until the work it waits for is done and the
        return-to-service checks pass.
      </SafetyNotice>
      <Field label="Why the press cannot go back to production" hint="What you found and why it cannot be put right on this visit." error={e?.reason?.message}>
        <Textarea className="min-h-24" rows={3} {...register('lockedOut.reason')} />
      </Field>
      <RadioCards
        legend="It waits for"
        options={Object.entries(WAITS_FOR_CHOICES).map(([value, label]) => ({ value, label }))}
        error={e?.waitsFor?.message}
        registration={register('lockedOut.waitsFor')}
      />
      {waitsFor === 'other' && (
        <Field label="What it waits for" hint="Finishes the sentence “not fit for production until …”, e.g. the plant’s electrician replaces the main isolator." error={e?.waitsForDetail?.message}>
          <TextInput autoComplete="off" {...register('lockedOut.waitsForDetail', { setValueAs: emptyAsAbsent })} />
        </Field>
      )}
    </Section>
  );
}
