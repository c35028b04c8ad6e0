import type { ReportDelivery } from '../../../shared/schemas/email';
import type { SessionUser } from '../../../shared/schemas/session';
import { reportDelivery } from '../reports/reports.service';
import { loadAccessibleVisit } from './visit-access.service';

/** After closing, the technician is told where the report went and whether it left the outbox (own visits only; the office sees all). */
export async function getReportDelivery(user: SessionUser, visitId: number): Promise<ReportDelivery | null> {
  await loadAccessibleVisit(user, visitId);
  return reportDelivery(visitId);
}
