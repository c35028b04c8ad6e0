import { useId } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { FieldError } from './field-error';

interface BigCheckboxProps {
  label: string;
  error?: string;
  registration: UseFormRegisterReturn;
}

/** A confirmation box big enough for a gloved finger: the whole card is the label. */
export function BigCheckbox({ label, error, registration }: BigCheckboxProps) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <div className="space-y-1.5">
      <label
        htmlFor={id}
        className="flex min-h-16 cursor-pointer items-center gap-4 rounded-lg border-2 border-surface-edge bg-surface-raised p-4 text-lg text-ink has-[:checked]:border-accent has-[:checked]:bg-accent-soft has-[:focus-visible]:ring-[3px] has-[:focus-visible]:ring-accent"
      >
        <input
          id={id}
          type="checkbox"
          className="h-8 w-8 shrink-0 accent-accent"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? errorId : undefined}
          {...registration}
        />
        <span>{label}</span>
      </label>
      <FieldError id={errorId} message={error} />
    </div>
  );
}
