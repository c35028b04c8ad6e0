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

// The answer's shape is shared with the client's outbox list.
export type { EmailDto } from '../../../shared/schemas/email';
