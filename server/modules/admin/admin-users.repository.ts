import type { Transaction } from 'sequelize';
import { User } from '../users/users.model';

export const findUserWithPassword = (id: number, transaction?: Transaction) => User.scope('withPassword').findByPk(id, { transaction });

/**
 * Ends every stored session of one person. passport keeps the user id under sess.passport.user;
 * deserializeUser would refuse an inactive account anyway, this makes the end immediate and total.
 */
export async function deleteSessionsOf(userId: number, transaction?: Transaction): Promise<number> {
  const [, result] = await User.sequelize!.query(`DELETE FROM session WHERE sess -> 'passport' ->> 'user' = :id`, {
    replacements: { id: String(userId) },
    transaction,
  });
  return (result as { rowCount?: number } | undefined)?.rowCount ?? 0;
}
