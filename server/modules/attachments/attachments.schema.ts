import { z } from 'zod';
import { idNumber } from '../../../shared/schemas/numbers';
import { nameText, text } from '../../../shared/schemas/text';

// Request shapes of the attachment routes, as the server parses them (multipart fields and params).

export const MAX_PHOTOS_PER_UPLOAD = 6;
export const MAX_CAPTION_LENGTH = 300;

export const visitParamsSchema = z.object({ visitId: idNumber() });
export const attachmentParamsSchema = visitParamsSchema.extend({ id: z.uuid('An attachment id is a UUID') });

const caption = z
  .string({ error: 'Send the caption once, as text; for one caption per photo use captions' })
  .pipe(text({ max: MAX_CAPTION_LENGTH, maxMessage: `A caption can be at most ${MAX_CAPTION_LENGTH} characters; shorten it` }));

const uploadId = z.uuid('An upload id is a UUID made by the tablet');

/** A text field holding a JSON array, e.g. captions='["Terminal block","Connector pin 3"]'. */
function jsonArray<T extends z.ZodType>(item: T, what: string) {
  return z
    .string({ error: `Send ${what} once, as a JSON array` })
    .transform((text, ctx) => {
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: 'custom', message: `${what} must be a JSON array, like ["first", "second"]` });
        return z.NEVER;
      }
    })
    .pipe(z.array(item, { error: `${what} must be a JSON array, like ["first", "second"]` }).max(MAX_PHOTOS_PER_UPLOAD, `${what} can list at most ${MAX_PHOTOS_PER_UPLOAD} entries`));
}

/**
 * The text fields of a photo upload (multipart/form-data, files in the field `photos`):
 * - `stepId`: the procedure step the photos belong to (all photos of one request share it);
 * - `caption`: one caption for every photo, or `captions`: a JSON array with one caption per photo, in order;
 * - `id`: a tablet-made UUID for a single photo, or `ids`: a JSON array of UUIDs, one per photo, in order.
 *   A retried upload with the same ids answers with the stored attachments instead of storing them twice.
 */
const unknownField = (issue: { code?: string; keys?: string[] }) =>
  issue.code === 'unrecognized_keys'
    ? `Unknown field ${issue.keys?.join(', ')}: a photo upload takes photos, stepId, caption or captions, and id or ids`
    : undefined;

export const photoUploadFieldsSchema = z
  .strictObject(
    {
      stepId: z
        .string({ error: 'Send stepId once, as text' })
        .trim()
        .min(1, 'stepId is empty; leave it out for a photo of the whole visit')
        .max(100, 'stepId can be at most 100 characters')
        .regex(/^[A-Za-z0-9_.:-]+$/, 'stepId holds letters, digits and . _ : - only')
        .optional(),
      caption: caption.optional(),
      captions: jsonArray(caption, 'captions').optional(),
      id: uploadId.optional(),
      ids: jsonArray(uploadId, 'ids').optional(),
    },
    { error: unknownField },
  )
  .superRefine((v, ctx) => {
    if (v.caption !== undefined && v.captions !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['captions'], message: 'Send caption or captions, not both' });
    }
    if (v.id !== undefined && v.ids !== undefined) ctx.addIssue({ code: 'custom', path: ['ids'], message: 'Send id or ids, not both' });
  });
export type PhotoUploadFields = z.infer<typeof photoUploadFieldsSchema>;

export const attachmentListQuerySchema = z.object({
  kind: z.enum(['photo', 'signature']).optional(),
  stepId: nameText({ min: 1, max: 100 }).optional(),
});
export type AttachmentListQuery = z.infer<typeof attachmentListQuerySchema>;

export type { AttachmentDto } from '../../../shared/schemas/attachment';
