import { ROLES, ROLE_LABELS } from '@shared/schemas/roles';
import { Select, type SelectProps } from '@/components/ui/select';

/** The roles a person can hold, in the control look. */
export function RoleSelect(props: SelectProps) {
  return (
    <Select {...props}>
      {ROLES.map((role) => (
        <option key={role} value={role}>
          {ROLE_LABELS[role]}
        </option>
      ))}
    </Select>
  );
}
