import { ForeignKeyConstraintError, UniqueConstraintError } from 'sequelize';
import { AppError } from './errors';

/** Turns the database's constraint refusals into answers a person can act on. */
export async function withConstraintMessages<T>(work: () => Promise<T>, messages: { unique: string; foreignKey?: string }): Promise<T> {
  try {
    return await work();
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw new AppError(409, 'conflict', messages.unique);
    if (err instanceof ForeignKeyConstraintError) {
      throw new AppError(409, 'conflict', messages.foreignKey ?? 'This record is linked to others and cannot be changed that way.');
    }
    throw err;
  }
}
