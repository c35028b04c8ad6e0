import type { UseFormRegisterReturn } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';

interface NumberFieldProps {
  label: string;
  unit: string;
  error?: string;
  hint?: string;
  registration: UseFormRegisterReturn;
}

/** A decimal entry with its unit shown beside the box and read out with the label. */
export function NumberField({ label, unit, error, hint, registration }: NumberFieldProps) {
  return (
    <Field label={`${label} (${unit})`} error={error} hint={hint}>
      <TextInput type="number" inputMode="decimal" step="any" className="max-w-[12rem]" {...registration} />
    </Field>
  );
}
