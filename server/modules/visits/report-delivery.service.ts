import type { ReportDelivery } from '../../../shared/schemas/email';
import type { SessionUser } from '../../../shared/schemas/session';
import { loadAccessibleVisit } from './visit-access.service';

/** Reads the outbox's state of a visit's newest report e-mail (the reports module answers it; visits only checks access). */
export type ReportDeliveryLookup = (visitId: number) => Promise<ReportDelivery | null>;

/** After closing, the technician is told where the report went and whether it left the outbox (own visits only; the office sees all). */
export async function getReportDelivery(user: SessionUser, visitId: number, lookup: ReportDeliveryLookup): Promise<ReportDelivery | null> {
  await loadAccessibleVisit(user, visitId);
  return lookup(visitId);
}
