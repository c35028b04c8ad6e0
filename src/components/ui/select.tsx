import type { Ref, SelectHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';
import { controlVariants, type ControlVariants } from './control-variants';

export interface SelectOption {
  value: string;
  label: string;
}

export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement>, Pick<ControlVariants, 'fit'> {
  ref?: Ref<HTMLSelectElement>;
  /** The choices, after any `<option>` children (e.g. a first "All …" or "Not chosen" entry). */
  options?: readonly SelectOption[];
}

/** A native select in the control look (native, so the tablet's own picker opens). */
export function Select({ className, fit, options = [], children, ...props }: SelectProps) {
  return (
    <select className={cn(controlVariants({ kind: 'select', fit }), className)} {...props}>
      {children}
      {options.map((option) => (
        <option key={option.value} value={option.value}>
          {option.label}
        </option>
      ))}
    </select>
  );
}
