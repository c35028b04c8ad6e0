import type { SelectHTMLAttributes, Ref } from 'react';
import { ROLES, ROLE_LABELS } from '@shared/schemas/roles';
import { cn } from '@/lib/cn';

export function RoleSelect({ className, ref, ...props }: SelectHTMLAttributes<HTMLSelectElement> & { ref?: Ref<HTMLSelectElement> }) {
  return (
    <select
      ref={ref}
      className={cn('block min-h-touch w-full rounded-lg border-2 border-surface-edge bg-surface-raised px-3 text-lg text-ink focus:border-accent focus:outline-none focus:ring-[3px] focus:ring-accent/40', className)}
      {...props}
    >
      {ROLES.map((role) => (
        <option key={role} value={role}>
          {ROLE_LABELS[role]}
        </option>
      ))}
    </select>
  );
}
