import type { Transaction } from 'sequelize';
import { enqueueEmail } from '../emails/outbox';
import { invitePath } from './invite-token';

export interface InviteMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** How invitations leave the building: the app's public address for the link, and the outbox. */
export interface InviteMailer {
  appUrl: string;
  enqueue: (message: InviteMessage, createdBy: number, transaction?: Transaction) => Promise<void>;
}

/** Invitations go through the outbox like every other e-mail, committed with the account they open. */
export function outboxInviteMailer(appUrl: string): InviteMailer {
  return {
    appUrl,
    enqueue: async (message, createdBy, transaction) => {
      await enqueueEmail({ kind: 'user_invite', ...message, createdBy }, transaction);
    },
  };
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function inviteMessage(appUrl: string, p: { to: string; name: string; invitedBy: string; token: string; expiresAt: Date }): InviteMessage {
  const link = new URL(invitePath(p.token), appUrl).toString();
  const until = p.expiresAt.toUTCString();
  const text = [
    `Hello ${p.name},`,
    '',
    `${p.invitedBy} has invited you to Crankwise, the press-control service workbook.`,
    'Open this link to choose your password; the account opens when you do:',
    link,
    '',
    `The link works once and expires ${until}. If you did not expect this, ignore the e-mail.`,
  ].join('\n');
  const html = `<p>Hello ${escapeHtml(p.name)},</p>
<p>${escapeHtml(p.invitedBy)} has invited you to Crankwise, the press-control service workbook.</p>
<p><a href="${escapeHtml(link)}">Choose your password</a>; the account opens when you do.</p>
<p>The link works once and expires ${escapeHtml(until)}. If you did not expect this, ignore the e-mail.</p>`;
  return { to: p.to, subject: 'Your Crankwise invitation', text, html };
}

export function sendInviteEmail(mailer: InviteMailer, actorId: number, p: Parameters<typeof inviteMessage>[1], transaction?: Transaction): Promise<void> {
  return mailer.enqueue(inviteMessage(mailer.appUrl, p), actorId, transaction);
}
