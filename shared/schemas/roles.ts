import { z } from 'zod';

export const ROLES = ['technician', 'manager', 'admin'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  technician: 'Technician',
  manager: 'Service manager',
  admin: 'Administrator',
};
