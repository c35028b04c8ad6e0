import { randomBytes } from 'node:crypto';
import type { AccountStatus, AdminUser, UserInviteInput, UserUpdateInput } from '../../../shared/schemas/admin-users';
import type { SessionUser } from '../../../shared/schemas/session';
import { withConstraintMessages } from '../../lib/db-errors';
import { AppError, notFound } from '../../lib/errors';
import { audit } from '../audit/audit';
import { User } from '../users/users.model';
import type { UserInvite } from './invite.model';
import { deleteSessionsOf, findUserWithPassword } from './admin-users.repository';
import { openInvites, revokeOpenInvites } from './invites.repository';
import { issueInvite } from './invites.service';
import { sendInviteEmail, type InviteMailer } from './invite-email';

// An invited person has no password until they accept; this value can never verify (not an argon2 hash).
const unusablePassword = () => `!invited:${randomBytes(16).toString('hex')}`;
const hasPassword = (user: User) => user.passwordHash.startsWith('$argon2');

function toAdminUser(user: User, invite: UserInvite | undefined, now = new Date()): AdminUser {
  const status: AccountStatus = user.active ? 'active' : invite ? 'invited' : 'deactivated';
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    status,
    invite: invite && !user.active ? { sentAt: invite.createdAt.toISOString(), expiresAt: invite.expiresAt.toISOString(), expired: invite.expiresAt <= now } : null,
    createdAt: user.createdAt.toISOString(),
  };
}

async function adminUser(id: number): Promise<AdminUser> {
  const user = await User.findByPk(id); // the default scope leaves the password hash out
  if (!user) throw notFound(`User ${id}`);
  const [invite] = await openInvites([id]);
  return toAdminUser(user, invite);
}

export async function listUsers(): Promise<AdminUser[]> {
  const users = await User.findAll({ order: [['name', 'ASC'], ['id', 'ASC']] });
  const invites = await openInvites(users.map((u) => u.id));
  return users.map((u) => toAdminUser(u, invites.find((i) => i.userId === u.id)));
}

const DUPLICATE = 'Someone with that e-mail address already has an account. Find them in the list instead of inviting them again.';

export async function inviteUser(actor: SessionUser, input: UserInviteInput, mailer: InviteMailer): Promise<AdminUser> {
  const user = await User.sequelize!.transaction(async (transaction) => {
    const created = await withConstraintMessages(
      () => User.create({ email: input.email, name: input.name, role: input.role, active: false, passwordHash: unusablePassword() }, { transaction }),
      { unique: DUPLICATE },
    );
    const issued = await issueInvite(created.id, actor.id, transaction);
    await audit({ visitId: null, actorId: actor.id, action: 'user_invited', detail: { userId: created.id, email: created.email, role: created.role } }, transaction);
    await sendInviteEmail(mailer, actor.id, { to: created.email, name: created.name, invitedBy: actor.name, inviteId: issued.invite.id, expiresAt: issued.invite.expiresAt }, transaction);
    return created;
  });
  return adminUser(user.id);
}

export async function resendInvite(actor: SessionUser, userId: number, mailer: InviteMailer): Promise<AdminUser> {
  await User.sequelize!.transaction(async (transaction) => {
    const user = await findUserWithPassword(userId, transaction);
    if (!user) throw notFound(`User ${userId}`);
    if (user.active) throw new AppError(409, 'already_active', `${user.name} has already set a password and can sign in; there is nothing to resend.`);
    if (hasPassword(user)) throw new AppError(409, 'deactivated', `${user.name}'s account was deactivated. Reactivate it instead of sending an invitation.`);
    const issued = await issueInvite(user.id, actor.id, transaction);
    await audit({ visitId: null, actorId: actor.id, action: 'user_invite_resent', detail: { userId: user.id } }, transaction);
    await sendInviteEmail(mailer, actor.id, { to: user.email, name: user.name, invitedBy: actor.name, inviteId: issued.invite.id, expiresAt: issued.invite.expiresAt }, transaction);
  });
  return adminUser(userId);
}

/** Changes role and/or active flag; deactivating ends the person's sessions in the same transaction. */
export async function updateUser(actor: SessionUser, userId: number, input: UserUpdateInput): Promise<AdminUser> {
  if (userId === actor.id) {
    throw new AppError(409, 'own_account', 'You cannot change your own role or deactivate yourself; ask another administrator, so the company is never left without one.');
  }
  await User.sequelize!.transaction(async (transaction) => {
    const user = await findUserWithPassword(userId, transaction);
    if (!user) throw notFound(`User ${userId}`);
    if (input.active === true && !user.active && !hasPassword(user)) {
      throw new AppError(409, 'never_accepted', `${user.name} has not set a password yet. Resend the invitation instead of reactivating.`);
    }
    const before = { role: user.role, active: user.active };
    await user.update({ ...(input.role ? { role: input.role } : {}), ...(input.active !== undefined ? { active: input.active } : {}) }, { transaction });
    let sessionsEnded = 0;
    if (input.active === false) {
      sessionsEnded = await deleteSessionsOf(user.id, transaction);
      // A withdrawn invitation must not open the account later.
      await revokeOpenInvites(user.id, transaction);
    }
    await audit({ visitId: null, actorId: actor.id, action: 'user_updated', detail: { userId: user.id, before, after: { role: user.role, active: user.active }, sessionsEnded } }, transaction);
  });
  return adminUser(userId);
}
