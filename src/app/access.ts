import type { Role } from '@shared/schemas/roles';

export const ALL_ROLES: readonly Role[] = ['technician', 'manager', 'admin'];
export const OFFICE_ROLES: readonly Role[] = ['manager', 'admin'];

/** Where each role lands after signing in. Technicians start at the presses until visits are built. */
export const ROLE_HOME: Record<Role, string> = {
  technician: '/presses',
  manager: '/presses',
  admin: '/presses',
};

export interface NavItem {
  to: string;
  label: string;
  roles: readonly Role[];
}

// Only screens that exist are listed; each role sees the ones its account may use.
export const NAV_ITEMS: readonly NavItem[] = [
  { to: '/presses', label: 'Presses', roles: ALL_ROLES },
  { to: '/customers', label: 'Customers', roles: OFFICE_ROLES },
];

export const navItemsFor = (role: Role) => NAV_ITEMS.filter((item) => item.roles.includes(role));
