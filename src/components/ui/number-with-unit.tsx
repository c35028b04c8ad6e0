import type { UseFormRegisterReturn } from 'react-hook-form';
import { Field } from './field';
import { TextInput } from './text-input';

interface NumberWithUnitProps {
  label: string;
  /** The unit's symbol, shown with the label and read out with it: "Ω", "V", "°C", "ms". */
  unit: string;
  error?: string;
  hint?: string;
  registration: UseFormRegisterReturn;
}

/** A decimal entry with its unit named in the label; the box is sized for a number, not a sentence. */
export function NumberWithUnit({ label, unit, error, hint, registration }: NumberWithUnitProps) {
  return (
    <Field label={`${label} (${unit})`} error={error} hint={hint}>
      <TextInput type="number" inputMode="decimal" step="any" className="max-w-[12rem]" {...registration} />
    </Field>
  );
}
