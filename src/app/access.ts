import type { Role } from '@shared/schemas/roles';

export const ALL_ROLES: readonly Role[] = ['technician', 'manager', 'admin'];
export const OFFICE_ROLES: readonly Role[] = ['manager', 'admin'];

/**
 * Where each role lands after signing in. Technicians start at their visits; managers and admins
 * keep the presses until their own office screens (review queue, dashboards) exist.
 */
export const ROLE_HOME: Record<Role, string> = {
  technician: '/visits',
  manager: '/presses',
  admin: '/presses',
};

export interface NavItem {
  to: string;
  label: string;
  roles: readonly Role[];
}

// Only screens that exist are listed; each role sees the ones its account may use.
// Managers and admins may work a visit themselves (DESIGN.md §2), so they see their own visits too.
export const NAV_ITEMS: readonly NavItem[] = [
  { to: '/visits', label: 'My visits', roles: ALL_ROLES },
  { to: '/presses', label: 'Presses', roles: ALL_ROLES },
  { to: '/customers', label: 'Customers', roles: OFFICE_ROLES },
];

export const navItemsFor = (role: Role) => NAV_ITEMS.filter((item) => item.roles.includes(role));
