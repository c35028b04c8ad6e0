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

/**
 * What became of a visit's newest report e-mail, for the technician after closing
 * (GET /api/visits/:id/report-delivery). Links are made at request time and only while they open.
 */
export interface ReportDelivery {
  issueNumber: number;
  to: string;
  status: EmailStatus;
  /** When the report was queued (the close), when it went out, and when the next try is due while queued. */
  queuedAt: string;
  sentAt: string | null;
  nextAttemptAt: string | null;
  attempts: number;
  /** Why the last try failed (the mail server's answer), written for a person. */
  lastError: string | null;
  /** The customer's report page and its PDF; null while the link does not open (returned visit, replaced or expired issue). */
  reportPath: string | null;
  pdfPath: string | null;
  /** The office time zone the times are shown in. */
  timeZone: string;
}
