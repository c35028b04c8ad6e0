import type { Ref, SelectHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';
import { controlVariants, type ControlVariants } from './control-variants';

export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement>, Pick<ControlVariants, 'fit'> {
  ref?: Ref<HTMLSelectElement>;
}

/** A native select in the control look (native, so the tablet's own picker opens). */
export function Select({ className, fit, ...props }: SelectProps) {
  return <select className={cn(controlVariants({ kind: 'select', fit }), className)} {...props} />;
}
