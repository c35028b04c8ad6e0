import { Router } from 'express';
import { requireRole } from '../../auth/require-role';
import { adminBandSetRoutes } from './band-sets.routes';
import { adminFirmwareRuleRoutes } from './firmware-rules.routes';
import { adminProcedureRoutes } from './procedures.routes';
import { adminUserRoutes } from './admin-users.routes';
import { outboxInviteMailer } from './invite-email';

/** Everything under /api/admin is for administrators only (DESIGN.md §2): one guard in front of all of it. */
export function adminRoutes(): Router {
  const router = Router();
  router.use(requireRole('admin'));
  router.use('/users', adminUserRoutes(outboxInviteMailer));
  router.use('/band-sets', adminBandSetRoutes());
  router.use('/procedures', adminProcedureRoutes());
  router.use('/firmware-rules', adminFirmwareRuleRoutes());
  return router;
}
