import type { Transaction } from 'sequelize';
import type { PreparedSignature } from '../attachments/attachments.service';

/**
 * What closing a visit needs from two modules that themselves read visits: the attachments module
 * checks and stores the signature, the reports module queues the report. createApp hands them to
 * visits here, so visits imports neither at run time and no module cycle forms.
 */
export interface VisitClosePorts {
  prepareSignature: (png: Buffer) => Promise<PreparedSignature>;
  enqueueVisitReport: (visitId: number, transaction: Transaction, actorId: number | null) => Promise<unknown>;
}

let ports: VisitClosePorts | null = null;

export function configureVisitClose(given: VisitClosePorts): void {
  ports = given;
}

export function visitClosePorts(): VisitClosePorts {
  if (!ports) throw new Error('Closing a visit is not configured: createApp calls configureVisitClose first.');
  return ports;
}
