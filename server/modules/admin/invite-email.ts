import type { Transaction } from 'sequelize';
import { LINK_MARK, LinkUnavailable, registerLinkRenderer } from '../emails/email-links.service';
import { enqueueEmail } from '../emails/outbox.service';
import { UserInvite } from './invite.model';
import { configureInviteKey, hashInviteToken, inviteTokenFor, invitePath } from './invite-token';

export interface InviteMessage {
  to: string;
  subject: string;
  /** Bodies with the link marker; the link is made when the outbox sends the message. */
  text: string;
  html: string;
}

/** How invitations leave the building: through the outbox, committed with the account they open. */
export interface InviteMailer {
  enqueue: (message: InviteMessage, inviteId: number, createdBy: number, transaction?: Transaction) => Promise<void>;
}

export const outboxInviteMailer: InviteMailer = {
  enqueue: async (message, inviteId, createdBy, transaction) => {
    await enqueueEmail({ kind: 'user_invite', ...message, link: { kind: 'invite', ref: inviteId }, createdBy }, transaction);
  },
};

/**
 * Called once by createApp: the key invitation tokens are made with, and how the outbox turns an
 * invitation id into its link at send time. A replaced, used or expired invitation is not sent.
 */
export function configureInvites(settings: { publicBaseUrl: string; linkKey: Buffer }): void {
  configureInviteKey(settings.linkKey);
  registerLinkRenderer('invite', async (inviteId) => {
    const invite = await UserInvite.findByPk(inviteId);
    if (!invite?.nonce) throw new LinkUnavailable('Not sent: this invitation can no longer be made. Send a new invitation from People.');
    if (invite.usedAt) throw new LinkUnavailable('Not sent: the invitation was already accepted.');
    if (invite.revokedAt) throw new LinkUnavailable('Not sent: a newer invitation replaced this one, or it was withdrawn.');
    if (invite.expiresAt.getTime() <= Date.now()) throw new LinkUnavailable('Not sent: the invitation expired. Send a new invitation from People.');
    const token = inviteTokenFor(invite.nonce, settings.linkKey);
    // A changed SESSION_SECRET makes a different token: sending it would only give a dead link.
    if (hashInviteToken(token) !== invite.tokenHash) throw new LinkUnavailable('Not sent: the server key changed since the invitation was made. Send a new invitation from People.');
    return new URL(invitePath(token), settings.publicBaseUrl).toString();
  });
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function inviteMessage(p: { to: string; name: string; invitedBy: string; expiresAt: Date }): InviteMessage {
  const until = p.expiresAt.toUTCString();
  const text = [
    `Hello ${p.name},`,
    '',
    `${p.invitedBy} has invited you to Crankwise, the press-control service workbook.`,
    'Open this link to choose your password; the account opens when you do:',
    LINK_MARK,
    '',
    `The link works once and expires ${until}. If you did not expect this, ignore the e-mail.`,
  ].join('\n');
  const html = `<p>Hello ${escapeHtml(p.name)},</p>
<p>${escapeHtml(p.invitedBy)} has invited you to Crankwise, the press-control service workbook.</p>
<p><a href="${LINK_MARK}">Choose your password</a>; the account opens when you do.</p>
<p>The link works once and expires ${escapeHtml(until)}. If you did not expect this, ignore the e-mail.</p>`;
  return { to: p.to, subject: 'Your Crankwise invitation', text, html };
}

export function sendInviteEmail(mailer: InviteMailer, actorId: number, p: Parameters<typeof inviteMessage>[0] & { inviteId: number }, transaction?: Transaction): Promise<void> {
  return mailer.enqueue(inviteMessage(p), p.inviteId, actorId, transaction);
}
