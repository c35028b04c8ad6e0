/** What people say and print for a visit: V-000123. */
export const visitReference = (id: number): string => `V-${String(id).padStart(6, '0')}`;
