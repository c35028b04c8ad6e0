import type { Role } from '@shared/schemas/roles';

export const ALL_ROLES: readonly Role[] = ['technician', 'manager', 'admin'];
export const OFFICE_ROLES: readonly Role[] = ['manager', 'admin'];

/** Where each role lands after signing in: technicians at their visits, the office at the review queue. */
export const ROLE_HOME: Record<Role, string> = {
  technician: '/visits',
  manager: '/review',
  admin: '/review',
};

export interface NavItem {
  to: string;
  label: string;
  roles: readonly Role[];
}

// Only screens that exist are listed; each role sees the ones its account may use.
// Managers and admins may work a visit themselves, so they see their own visits too.
export const NAV_ITEMS: readonly NavItem[] = [
  { to: '/review', label: 'Review queue', roles: OFFICE_ROLES },
  { to: '/visits/all', label: 'All visits', roles: OFFICE_ROLES },
  { to: '/dashboard', label: 'Dashboard', roles: OFFICE_ROLES },
  { to: '/visits', label: 'My visits', roles: ALL_ROLES },
  { to: '/presses', label: 'Presses', roles: ALL_ROLES },
  { to: '/admin', label: 'Administration', roles: OFFICE_ROLES },
];

export const ADMIN_ONLY: readonly Role[] = ['admin'];

export interface AdminSection extends NavItem {
  description: string;
}

/** The administration hub's sections: managers keep the directory, admins also the reference data. */
export const ADMIN_SECTIONS: readonly AdminSection[] = [
  { to: '/admin/customers', label: 'Customers', roles: OFFICE_ROLES, description: 'Plants we serve and the contact who receives reports.' },
  { to: '/admin/sites', label: 'Sites', roles: OFFICE_ROLES, description: 'Where each customer’s presses stand.' },
  { to: '/admin/presses', label: 'Presses', roles: OFFICE_ROLES, description: 'Asset tags, models, sensor generation and firmware on record.' },
  { to: '/admin/users', label: 'People and roles', roles: ADMIN_ONLY, description: 'Invite technicians and managers, change roles, deactivate.' },
  { to: '/admin/band-sets', label: 'Band sets', roles: ADMIN_ONLY, description: 'Reference values per sensor generation; publish a new version.' },
  { to: '/admin/procedures', label: 'Procedures', roles: ADMIN_ONLY, description: 'Import, check and publish diagnosis procedures.' },
  { to: '/admin/firmware-rules', label: 'Firmware rules', roles: ADMIN_ONLY, description: 'Which press-control and monitor-module versions work together.' },
];

export const navItemsFor = (role: Role) => NAV_ITEMS.filter((item) => item.roles.includes(role));
