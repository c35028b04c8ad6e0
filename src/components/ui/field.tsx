import type { ReactElement, ReactNode } from 'react';
import { cloneElement, useId } from 'react';
import { FieldError } from './field-error';
import { Hint } from './hint';
import { Label } from './label';

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
  /** Classes for the wrapper, e.g. to place it in a grid. */
  className?: string;
  children: ReactElement<FieldControlProps>;
}

/**
 * A visible label, optional hint and error text wired to one form control: the control gets the
 * id, aria-invalid when there is an error, and aria-describedby naming the hint and the error.
 */
export function Field({ label, hint, error, className, children }: FieldProps) {
  const id = useId();
  const controlId = children.props.id ?? `${id}-control`;
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [children.props['aria-describedby'], hintId, errorId].filter(Boolean).join(' ') || undefined;

  return (
    <div className={className ?? 'space-y-1.5'}>
      <Label htmlFor={controlId}>{label}</Label>
      {hint && <Hint id={hintId}>{hint}</Hint>}
      {cloneElement(children, { id: controlId, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      <FieldError id={errorId} message={error} />
    </div>
  );
}
