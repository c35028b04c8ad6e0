import type { InputHTMLAttributes, Ref } from 'react';
import { cn } from '@/lib/cn';
import { controlVariants, type ControlVariants } from './control-variants';

export interface TextInputProps extends InputHTMLAttributes<HTMLInputElement>, Pick<ControlVariants, 'fit'> {
  ref?: Ref<HTMLInputElement>;
}

export function TextInput({ className, fit, ...props }: TextInputProps) {
  return <input className={cn(controlVariants({ kind: 'input', fit }), className)} {...props} />;
}
