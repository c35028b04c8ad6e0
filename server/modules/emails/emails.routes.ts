import { Router } from 'express';
import { idParamSchema } from '../../../shared/schemas/common';
import { OFFICE_ROLES, requireRole } from '../../auth/require-role';
import { valid, validate } from '../../lib/validate';
import { emailListQuerySchema, emailResendSchema } from './emails.schema';
import { listEmails, resendEmail } from './emails.service';

/** Mounted at /api/emails: the office sees what went out, what failed and why, and resends. */
export function emailRoutes(): Router {
  const router = Router();
  router.use(requireRole(...OFFICE_ROLES));

  router.get('/', validate('query', emailListQuerySchema), async (req, res) => {
    res.json(await listEmails(valid(req, 'query', emailListQuerySchema)));
  });

  router.post('/:id/resend', validate('params', idParamSchema), validate('body', emailResendSchema), async (req, res) => {
    res.json(await resendEmail(req.user!, valid(req, 'params', idParamSchema).id, valid(req, 'body', emailResendSchema)));
  });

  return router;
}
