import { z } from 'zod';
import { nameText } from '../../../shared/schemas/text';

// The service checks the link's shape itself, so a malformed link gets the same refusal as any other bad link.
const token = z.string().max(200);

export const reportTokenParamsSchema = z.object({ token });
export const reportThumbParamsSchema = z.object({ token, attachmentId: z.uuid() });
export const acknowledgeSchema = z.object({
  name: nameText({ max: 120, maxMessage: 'Keep the name under 120 characters' })
    .optional()
    .transform((v) => (v ? v : undefined)),
});
