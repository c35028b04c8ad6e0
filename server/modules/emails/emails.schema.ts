import { z } from 'zod';
import { EMAIL_STATUSES } from './emails.model';

export const emailListQuerySchema = z.object({
  visitId: z.coerce.number().int().positive().optional(),
  status: z.enum(EMAIL_STATUSES, 'Status is one of queued, sending, sent or failed').optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});
export type EmailListQuery = z.infer<typeof emailListQuerySchema>;

export const emailResendSchema = z.object({
  /** A corrected address, when the first one bounced. */
  to: z.email('Enter a valid e-mail address, like name@plant.com').max(200).optional(),
});
export type EmailResendInput = z.infer<typeof emailResendSchema>;

export interface EmailDto {
  id: number;
  visitId: number | null;
  kind: string;
  to: string;
  subject: string;
  status: (typeof EMAIL_STATUSES)[number];
  attempts: number;
  lastError: string | null;
  nextAttemptAt: string | null;
  sentAt: string | null;
  messageId: string | null;
  attachments: { filename: string; contentType: string }[];
  createdAt: string;
  updatedAt: string;
}
