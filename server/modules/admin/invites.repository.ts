import { Op, type Transaction } from 'sequelize';
import { UserInvite } from './invite.model';

export const findInviteByHash = (tokenHash: string, transaction?: Transaction) =>
  UserInvite.findOne({ where: { tokenHash }, transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });

export const openInvites = (userIds: number[]) =>
  UserInvite.findAll({ where: { userId: { [Op.in]: userIds }, usedAt: null, revokedAt: null } });

export async function revokeOpenInvites(userId: number, transaction?: Transaction): Promise<void> {
  await UserInvite.update({ revokedAt: new Date() }, { where: { userId, usedAt: null, revokedAt: null }, transaction });
}

export const insertInvite = (values: { userId: number; tokenHash: string; nonce: string; expiresAt: Date; createdBy: number | null }, transaction?: Transaction) =>
  UserInvite.create({ ...values, usedAt: null, revokedAt: null }, { transaction });
