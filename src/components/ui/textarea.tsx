import type { Ref, TextareaHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';
import { controlVariants, type ControlVariants } from './control-variants';

export interface TextareaProps extends TextareaHTMLAttributes<HTMLTextAreaElement>, Pick<ControlVariants, 'fit'> {
  ref?: Ref<HTMLTextAreaElement>;
}

export function Textarea({ className, fit, ...props }: TextareaProps) {
  return <textarea className={cn(controlVariants({ kind: 'textarea', fit }), className)} {...props} />;
}
