import { Controller } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { Section } from '@/components/ui/section';
import { TextInput } from '@/components/ui/text-input';
import { useCloseOutForm } from '../hooks/use-close-out-form';
import { SignaturePad } from './signature-pad';

/** Who signs for the customer, where the report goes, and the signature itself. */
export function ContactSection() {
  const { register, control, errors } = useCloseOutForm();
  return (
    <Section variant="form" title="Customer sign-off">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Contact name" hint="The person at the plant who signs." error={errors.contactName?.message}>
          <TextInput autoComplete="off" {...register('contactName')} />
        </Field>
        <Field label="Contact e-mail" hint="The report is sent here." error={errors.contactEmail?.message}>
          <TextInput type="email" inputMode="email" autoCapitalize="none" spellCheck={false} autoComplete="off" {...register('contactEmail')} />
        </Field>
      </div>
      <Controller
        control={control}
        name="signaturePng"
        render={({ field, fieldState }) => (
          <SignaturePad
            label="Customer signature"
            value={field.value ?? ''}
            onChange={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
            ref={field.ref}
          />
        )}
      />
    </Section>
  );
}
