import type { Transaction } from 'sequelize';
import type { StaleVersionCurrent } from '../../../shared/schemas/visit-detail';
import { AppError } from '../../lib/errors';
import type { Visit } from './visits.model';

/**
 * A write based on what someone else has changed since (another tab, another device). The body's
 * `current` holds the server's value, so the person can compare and choose; nothing is overwritten.
 */
export const staleVersion = (message: string, current: StaleVersionCurrent) => new AppError(409, 'stale_version', message, undefined, current);

/** Every write to a visit bumps its version in the write's own transaction (the visit row is locked by then). */
export async function bumpVersion(visit: Visit, transaction: Transaction): Promise<void> {
  await visit.increment('version', { by: 1, transaction });
}
