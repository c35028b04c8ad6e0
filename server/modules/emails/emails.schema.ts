import { z } from 'zod';
import { pageNumber, pageSize } from '../../../shared/schemas/common';
import { idNumber } from '../../../shared/schemas/numbers';
import { EMAIL_STATUSES } from './emails.model';

export const emailListQuerySchema = z.object({
  visitId: idNumber().optional(),
  status: z.enum(EMAIL_STATUSES, 'Status is one of queued, sending, sent or failed').optional(),
  page: pageNumber.default(1),
  pageSize: pageSize(100).default(25),
});
export type EmailListQuery = z.infer<typeof emailListQuerySchema>;

export const emailResendSchema = z.object({
  /** A corrected address, when the first one bounced. */
  to: z.email('Enter a valid e-mail address, like name@plant.com').max(200).optional(),
});
export type EmailResendInput = z.infer<typeof emailResendSchema>;

// The answer's shape is shared with the client's outbox list.
export type { EmailDto } from '../../../shared/schemas/email';
