import type { Transaction } from 'sequelize';
import { logger } from '../../lib/logger';
import { audit } from '../audit/audit';
import { LinkUnavailable, renderLinks } from './email-links.service';
import { Email, EmailAttachment, type LinkKind } from './emails.model';
import { mailer } from './mail-transport';
import { MAX_ATTEMPTS, describeSendError, isPermanentSmtpError, retryDelayMs } from './retry-policy';

export interface NewEmail {
  visitId?: number | null;
  /** What the message is for, e.g. 'visit_report', 'user_invite' (lower case and underscores). */
  kind: string;
  to: string;
  subject: string;
  /** Bodies with the {{link}} marker where the link goes (never the link itself when it is a credential). */
  html: string;
  text: string;
  /** What the link is made from when the message is sent. */
  link?: { kind: LinkKind; ref: number };
  attachments?: { filename: string; contentType: string; content: Buffer }[];
  createdBy?: number | null;
}

/**
 * Puts a message in the outbox; the worker sends it. Pass the caller's transaction so the message
 * exists exactly when the change that caused it is committed.
 */
export async function enqueueEmail(email: NewEmail, transaction?: Transaction): Promise<Email> {
  const row = await Email.create(
    {
      visitId: email.visitId ?? null,
      kind: email.kind,
      toAddress: email.to,
      subject: email.subject,
      html: email.html,
      text: email.text,
      linkKind: email.link?.kind ?? null,
      linkRef: email.link?.ref ?? null,
      createdBy: email.createdBy ?? null,
    },
    { transaction },
  );
  for (const a of email.attachments ?? []) {
    await EmailAttachment.create({ emailId: row.id, filename: a.filename, contentType: a.contentType, content: a.content }, { transaction });
  }
  return row;
}

// A row left in 'sending' this long belonged to a process that died mid-send: it is due again.
const STALE_SENDING_MS = 10 * 60_000;

/** Marks due rows 'sending' and counts the try; SKIP LOCKED lets several workers share the table. */
async function claimDue(now: Date, limit: number): Promise<number[]> {
  const [rows] = await Email.sequelize!.query(
    `UPDATE emails SET status = 'sending', attempts = attempts + 1, updated_at = :now
      WHERE id IN (
        SELECT id FROM emails
         WHERE (status = 'queued' AND next_attempt_at <= :now) OR (status = 'sending' AND updated_at < :stale)
         ORDER BY next_attempt_at, id
         LIMIT :limit
         FOR UPDATE SKIP LOCKED)
      RETURNING id`,
    { replacements: { now, stale: new Date(now.getTime() - STALE_SENDING_MS), limit } },
  );
  return (rows as { id: number }[]).map((r) => r.id);
}

export interface OutboxRun {
  sent: number;
  retrying: number;
  failed: number;
}

async function sendOne(id: number, now: Date, run: OutboxRun): Promise<void> {
  const email = (await Email.findByPk(id, { include: [{ model: EmailAttachment, as: 'attachments' }] }))!;
  const { transporter, from } = mailer();
  try {
    const body = await renderLinks(email);
    const info = (await transporter.sendMail({
      from,
      to: email.toAddress,
      subject: email.subject,
      html: body.html,
      text: body.text,
      attachments: (email.attachments ?? []).map((a) => ({ filename: a.filename, contentType: a.contentType, content: a.content })),
    })) as { messageId?: string; response?: string };
    await email.update({ status: 'sent', sentAt: new Date(), messageId: info.messageId ?? null, lastError: null });
    run.sent++;
    await audit({ visitId: email.visitId, actorId: null, action: 'email_sent', detail: { emailId: email.id, kind: email.kind, to: email.toAddress, messageId: info.messageId ?? null, attempt: email.attempts, smtpResponse: info.response ?? null } });
  } catch (err) {
    const error = describeSendError(err);
    // A link that can no longer be made (replaced invitation, corrected report) will not come back.
    const giveUp = err instanceof LinkUnavailable || isPermanentSmtpError(err) || email.attempts >= MAX_ATTEMPTS;
    if (giveUp) {
      await email.update({ status: 'failed', lastError: error });
      run.failed++;
      await audit({ visitId: email.visitId, actorId: null, action: 'email_failed', detail: { emailId: email.id, kind: email.kind, to: email.toAddress, attempts: email.attempts, error } });
      logger.error({ emailId: email.id, attempts: email.attempts, error }, 'e-mail failed; a manager can resend it');
    } else {
      const nextAttemptAt = new Date(now.getTime() + retryDelayMs(email.attempts));
      await email.update({ status: 'queued', lastError: error, nextAttemptAt });
      run.retrying++;
      logger.warn({ emailId: email.id, attempts: email.attempts, nextAttemptAt, error }, 'e-mail not sent; will retry');
    }
  }
}

/** Sends what is due now, once. The worker calls it on a timer; tests call it directly. */
export async function processOutboxOnce(options: { now?: Date; limit?: number } = {}): Promise<OutboxRun> {
  const now = options.now ?? new Date();
  const run: OutboxRun = { sent: 0, retrying: 0, failed: 0 };
  for (const id of await claimDue(now, options.limit ?? 20)) await sendOne(id, now, run);
  return run;
}

/** Runs the outbox in this process every pollMs; the returned function stops it after the current pass. */
export function startOutboxWorker({ pollMs }: { pollMs: number }): () => Promise<void> {
  let timer: NodeJS.Timeout | undefined;
  let running: Promise<void> | undefined;
  let stopped = false;
  const tick = () => {
    running = processOutboxOnce()
      .then((run) => {
        if (run.sent || run.failed || run.retrying) logger.info(run, 'outbox pass');
      })
      .catch((err: unknown) => logger.error({ err }, 'outbox pass failed; trying again later'))
      .finally(() => {
        if (!stopped) timer = setTimeout(tick, pollMs);
      });
  };
  timer = setTimeout(tick, Math.min(pollMs, 1000));
  return async () => {
    stopped = true;
    clearTimeout(timer);
    await running;
  };
}
