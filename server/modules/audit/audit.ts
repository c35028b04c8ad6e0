import type { Transaction } from 'sequelize';
import { currentClient } from '../../lib/request-context';
import { AuditEvent } from './audit-event.model';

/**
 * Appends one event to the audit trail (who, what, when, and the detail needed to explain it). An
 * event done by a signed-in person inside a request also records the device it came from (address
 * and browser), so a safety gate confirmed by a manager away from the press is visible as such.
 */
export async function audit(
  entry: { visitId: number | null; actorId: number | null; action: string; detail?: Record<string, unknown> },
  transaction?: Transaction,
): Promise<void> {
  const client = entry.actorId !== null ? currentClient() : undefined;
  const detail = { ...(entry.detail ?? {}), ...(client ? { client } : {}) };
  await AuditEvent.create({ visitId: entry.visitId, actorId: entry.actorId, action: entry.action, detail }, { transaction });
}
