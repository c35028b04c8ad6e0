import { useId, type InputHTMLAttributes } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { choiceCardVariants } from './control-variants';
import { FieldError } from './field-error';

interface CheckboxCardProps extends Pick<InputHTMLAttributes<HTMLInputElement>, 'checked' | 'disabled' | 'onChange'> {
  label: string;
  error?: string;
  /** A react-hook-form field; without it the box is controlled with `checked` and `onChange`. */
  registration?: UseFormRegisterReturn;
  /** `start` for labels that run to several lines (the box stays by the first). */
  align?: 'center' | 'start';
}

/** A confirmation box big enough for a gloved finger: the whole card is the label. */
export function CheckboxCard({ label, error, registration, align = 'center', ...input }: CheckboxCardProps) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <div className="space-y-1.5">
      <label htmlFor={id} className={choiceCardVariants({ align })}>
        <input
          id={id}
          type="checkbox"
          className="h-8 w-8 shrink-0 accent-accent"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? errorId : undefined}
          {...input}
          {...registration}
        />
        <span>{label}</span>
      </label>
      <FieldError id={errorId} message={error} />
    </div>
  );
}
