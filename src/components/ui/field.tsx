import type { ReactElement, ReactNode } from 'react';
import { cloneElement, useId } from 'react';

interface FieldControlProps {
  id?: string;
  'aria-invalid'?: boolean;
  'aria-describedby'?: string;
}

interface FieldProps {
  label: string;
  /** A one-line hint shown under the label, read out with the control. */
  hint?: ReactNode;
  error?: string;
  children: ReactElement<FieldControlProps>;
}

/** A visible label, optional hint and error text wired to one form control. */
export function Field({ label, hint, error, children }: FieldProps) {
  const id = useId();
  const controlId = `${id}-control`;
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;

  return (
    <div className="space-y-1.5">
      <label htmlFor={controlId} className="block text-lg font-semibold text-ink">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-base text-ink-muted">
          {hint}
        </p>
      )}
      {cloneElement(children, { id: controlId, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      {error && (
        <p id={errorId} role="alert" className="flex items-start gap-2 text-base font-medium text-verdict-out_of_band">
          <span aria-hidden="true" className="font-bold">
            ✕
          </span>
          {error}
        </p>
      )}
    </div>
  );
}
