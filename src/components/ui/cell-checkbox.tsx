import type { InputHTMLAttributes } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';

interface CellCheckboxProps extends Pick<InputHTMLAttributes<HTMLInputElement>, 'checked' | 'disabled' | 'onChange'> {
  /** Names the box for screen readers (a table cell has no visible label of its own). */
  label: string;
  registration?: UseFormRegisterReturn;
}

/** A checkbox inside a table cell: the whole cell-sized area (44 px or more) is its target. */
export function CellCheckbox({ label, registration, ...input }: CellCheckboxProps) {
  return (
    <label className="inline-flex min-h-touch min-w-touch cursor-pointer items-center justify-center rounded-lg focus-within:ring-[3px] focus-within:ring-accent">
      <input type="checkbox" aria-label={label} className="h-8 w-8 accent-accent" {...input} {...registration} />
    </label>
  );
}
