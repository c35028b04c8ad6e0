import { z } from 'zod';

export const VISIT_STATUSES = ['draft', 'in_progress', 'closed', 'approved', 'returned'] as const;
export const visitStatusSchema = z.enum(VISIT_STATUSES);
export type VisitStatus = z.infer<typeof visitStatusSchema>;

/** The visit status machine (DESIGN.md §3); the database enforces the same pairs with a trigger. */
export const VISIT_TRANSITIONS: Record<VisitStatus, readonly VisitStatus[]> = {
  draft: ['in_progress'],
  in_progress: ['closed'],
  closed: ['approved', 'returned'],
  returned: ['in_progress'],
  approved: [],
};

export function canMoveVisit(from: VisitStatus, to: VisitStatus): boolean {
  return VISIT_TRANSITIONS[from].includes(to);
}
