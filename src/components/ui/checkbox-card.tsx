import { useId } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { choiceCardVariants } from './control-variants';
import { FieldError } from './field-error';

interface CheckboxCardProps {
  label: string;
  error?: string;
  registration: UseFormRegisterReturn;
}

/** A confirmation box big enough for a gloved finger: the whole card is the label. */
export function CheckboxCard({ label, error, registration }: CheckboxCardProps) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <div className="space-y-1.5">
      <label
        htmlFor={id}
        className={choiceCardVariants({ align: 'center' })}
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
