import type { Transaction } from 'sequelize';
import type { InvitePreview } from '../../../shared/schemas/admin-users';
import { hashPassword } from '../../auth/password';
import { AppError } from '../../lib/errors';
import { audit } from '../audit/audit';
import { User } from '../users/users.model';
import type { UserInvite } from './invite.model';
import { INVITE_LIFETIME_MS, hashInviteToken, newInviteToken } from './invite-token';
import { findInviteByHash, insertInvite, revokeOpenInvites } from './invites.repository';

const ASK_AGAIN = 'Ask your administrator to send you a new invitation.';

/**
 * Replaces any open invitation of the person with a new one. The caller queues the e-mail with a
 * reference to the returned invitation; the token is made again when the e-mail is sent.
 */
export async function issueInvite(userId: number, actorId: number | null, transaction?: Transaction, now = new Date()) {
  await revokeOpenInvites(userId, transaction);
  const { nonce, tokenHash } = newInviteToken();
  const invite = await insertInvite({ userId, tokenHash, nonce, expiresAt: new Date(now.getTime() + INVITE_LIFETIME_MS), createdBy: actorId }, transaction);
  return { invite };
}

function refuseUnusable(invite: UserInvite | null, now: Date): asserts invite is UserInvite {
  if (!invite) throw new AppError(404, 'invite_not_found', `This invitation link is not known. Check that the whole link was opened, or ${ASK_AGAIN.toLowerCase()}`);
  if (invite.usedAt) throw new AppError(410, 'invite_used', 'This invitation has already been used to set a password. Sign in with that password instead.');
  if (invite.revokedAt) throw new AppError(410, 'invite_revoked', `This invitation was replaced by a newer one or withdrawn. Use the newest e-mail, or ${ASK_AGAIN.toLowerCase()}`);
  if (invite.expiresAt.getTime() <= now.getTime()) throw new AppError(410, 'invite_expired', `This invitation has expired. ${ASK_AGAIN}`);
}

export async function previewInvite(token: string, now = new Date()): Promise<InvitePreview> {
  const invite = await findInviteByHash(hashInviteToken(token));
  refuseUnusable(invite, now);
  const user = (await User.findByPk(invite.userId))!;
  return { email: user.email, name: user.name, expiresAt: invite.expiresAt.toISOString() };
}

/** Sets the person's password and opens the account; the link works once. */
export async function acceptInvite(token: string, password: string, now = new Date()): Promise<{ email: string }> {
  // Hash before the transaction: argon2 takes a moment and must not hold the row lock.
  const passwordHash = await hashPassword(password);
  return User.sequelize!.transaction(async (transaction) => {
    const invite = await findInviteByHash(hashInviteToken(token), transaction);
    refuseUnusable(invite, now);
    const user = (await User.findByPk(invite.userId, { transaction }))!;
    await user.update({ passwordHash, active: true }, { transaction });
    await invite.update({ usedAt: now }, { transaction });
    await audit({ visitId: null, actorId: user.id, action: 'user_invite_accepted', detail: { userId: user.id, inviteId: invite.id } }, transaction);
    return { email: user.email };
  });
}
