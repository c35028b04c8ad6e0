import path from 'node:path';
import { pipeline } from 'node:stream';
import { Router, type NextFunction, type Request, type Response } from 'express';
import { ANY_ROLE, requireRole } from '../../auth/require-role';
import { logger } from '../../lib/logger';
import { valid, validate } from '../../lib/validate';
import type { AttachmentService } from './attachments.service';
import { attachmentListQuerySchema, attachmentParamsSchema, photoUploadFieldsSchema, visitParamsSchema } from './attachments.schema';
import { discardUploadedPhotos, photoUpload, uploadedPhotos } from './photo-upload';

/**
 * Mounted at /api/visits/:visitId/attachments; who may reach which visit is decided by visit-access.
 * The service is the process's one attachment service, configured in createApp.
 */
export function attachmentRoutes(attachments: AttachmentService, { maxUploadBytes, uploadDir }: { maxUploadBytes: number; uploadDir: string }): Router {
  const router = Router({ mergeParams: true });
  router.use(requireRole(...ANY_ROLE));
  const upload = photoUpload({
    maxBytes: maxUploadBytes,
    tempRoot: path.join(uploadDir, 'tmp'),
    checkAccess: (req) => attachments.checkUploadAccess(req.user!, valid(req, 'params', visitParamsSchema).visitId),
  });

  router.get('/', validate('params', visitParamsSchema), validate('query', attachmentListQuerySchema), async (req, res) => {
    const items = await attachments.list(req.user!, valid(req, 'params', visitParamsSchema).visitId, valid(req, 'query', attachmentListQuerySchema));
    res.json({ items });
  });

  router.post(
    '/',
    validate('params', visitParamsSchema),
    upload,
    validate('body', photoUploadFieldsSchema),
    async (req: Request, res: Response) => {
      const { visitId } = valid(req, 'params', visitParamsSchema);
      const result = await attachments.uploadPhotos(req.user!, visitId, uploadedPhotos(req), valid(req, 'body', photoUploadFieldsSchema));
      // The temp files go before the answer does, so nothing of the request is left once it is answered.
      await discardUploadedPhotos(req);
      res.status(result.created ? 201 : 200).json({ items: result.items });
    },
    async (err: unknown, req: Request, _res: Response, next: NextFunction) => {
      await discardUploadedPhotos(req);
      next(err);
    },
  );

  for (const variant of ['file', 'thumb'] as const) {
    router.get(`/:id/${variant}`, validate('params', attachmentParamsSchema), async (req, res) => {
      const { visitId, id } = valid(req, 'params', attachmentParamsSchema);
      const file = await attachments.openFile(req.user!, visitId, id, variant);
      res.set({
        'Content-Type': file.mimeType,
        'Content-Length': String(file.size),
        'Content-Disposition': `inline; filename="${file.fileName}"`,
        'Cache-Control': 'private, max-age=3600',
        'X-Content-Type-Options': 'nosniff',
      });
      pipeline(file.body, res, (err) => {
        if (err) logger.debug({ err, attachmentId: id }, 'attachment download ended early');
      });
    });
  }

  router.delete('/:id', validate('params', attachmentParamsSchema), async (req, res) => {
    const { visitId, id } = valid(req, 'params', attachmentParamsSchema);
    await attachments.remove(req.user!, visitId, id);
    res.status(204).end();
  });

  return router;
}
