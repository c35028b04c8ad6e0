import type { Transaction } from 'sequelize';
import { AuditEvent } from './audit-event.model';

/** Appends one event to the audit trail (who, what, when, and the detail needed to explain it). */
export async function audit(
  entry: { visitId: number | null; actorId: number | null; action: string; detail?: Record<string, unknown> },
  transaction?: Transaction,
): Promise<void> {
  await AuditEvent.create({ visitId: entry.visitId, actorId: entry.actorId, action: entry.action, detail: entry.detail ?? {} }, { transaction });
}
