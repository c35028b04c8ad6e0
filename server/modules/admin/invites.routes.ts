import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { inviteAcceptSchema, inviteTokenParamSchema } from '../../../shared/schemas/admin-users';
import { AppError } from '../../lib/errors';
import { valid, validate } from '../../lib/validate';
import { acceptInvite, previewInvite } from './invites.service';

/**
 * Public: the person who got the e-mail has no session yet. The token itself is the credential,
 * so the routes are rate-limited per client address like sign-in.
 */
export function inviteRoutes(): Router {
  const router = Router();
  const limiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: 30,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError(429, 'too_many_attempts', 'Too many attempts from this device. Wait 15 minutes and open the link again.')),
  });
  const token = validate('params', inviteTokenParamSchema);

  router.get('/:token', limiter, token, async (req, res) => {
    res.json(await previewInvite(valid(req, 'params', inviteTokenParamSchema).token));
  });
  router.post('/:token/accept', limiter, token, validate('body', inviteAcceptSchema), async (req, res) => {
    res.json(await acceptInvite(valid(req, 'params', inviteTokenParamSchema).token, valid(req, 'body', inviteAcceptSchema).password));
  });
  return router;
}
