/** The outbox's states: queued → sending → sent, or failed after the last try (or an SMTP 5xx). */
export const EMAIL_STATUSES = ['queued', 'sending', 'sent', 'failed'] as const;
export type EmailStatus = (typeof EMAIL_STATUSES)[number];

/** One outbox e-mail as GET /api/emails lists it. */
export interface EmailDto {
  id: number;
  visitId: number | null;
  kind: string;
  to: string;
  subject: string;
  status: EmailStatus;
  attempts: number;
  lastError: string | null;
  nextAttemptAt: string | null;
  sentAt: string | null;
  messageId: string | null;
  attachments: { filename: string; contentType: string }[];
  createdAt: string;
  updatedAt: string;
}
