import { Router } from 'express';
import { requireRole } from '../../auth/require-role';
import { versionedRoutes } from '../../lib/versioned-records/versioned-routes';
import { bandSets } from './band-sets';
import { firmwareRules } from './firmware-rules';
import { procedureRoutes } from './procedures';
import { adminUserRoutes } from './admin-users.routes';
import { outboxInviteMailer } from './invite-email';

/** Everything under /api/admin is for administrators only: one guard in front of all of it. */
export function adminRoutes(): Router {
  const router = Router();
  router.use(requireRole('admin'));
  router.use('/users', adminUserRoutes(outboxInviteMailer));
  router.use('/band-sets', versionedRoutes(bandSets));
  router.use('/procedures', procedureRoutes());
  router.use('/firmware-rules', versionedRoutes(firmwareRules));
  return router;
}
