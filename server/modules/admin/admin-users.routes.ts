import { Router } from 'express';
import { userInviteSchema, userUpdateSchema } from '../../../shared/schemas/admin-users';
import { idParamSchema } from '../../../shared/schemas/common';
import { valid, validate } from '../../lib/validate';
import { inviteUser, listUsers, resendInvite, updateUser } from './admin-users.service';
import type { InviteMailer } from './invite-email';

/** Mounted under the admin-only router. */
export function adminUserRoutes(mailer: InviteMailer): Router {
  const router = Router();

  router.get('/', async (_req, res) => {
    res.json(await listUsers());
  });

  router.post('/', validate('body', userInviteSchema), async (req, res) => {
    res.status(201).json(await inviteUser(req.user!, valid(req, 'body', userInviteSchema), mailer));
  });

  router.patch('/:id', validate('params', idParamSchema), validate('body', userUpdateSchema), async (req, res) => {
    res.json(await updateUser(req.user!, valid(req, 'params', idParamSchema).id, valid(req, 'body', userUpdateSchema)));
  });

  router.post('/:id/invite', validate('params', idParamSchema), async (req, res) => {
    res.json(await resendInvite(req.user!, valid(req, 'params', idParamSchema).id, mailer));
  });

  return router;
}
