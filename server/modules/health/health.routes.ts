import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { DATABASE_UNAVAILABLE } from '../../lib/errors';

/** Open to anyone (load balancers, the start script): says whether the database answers. */
export function healthRoutes(sequelize: Sequelize): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const started = performance.now();
    try {
      const [rows] = await sequelize.query('SELECT count(*)::int AS migrations FROM schema_migrations');
      const migrations = (rows as { migrations: number }[])[0]?.migrations ?? 0;
      res.json({ status: 'ok', database: { state: 'up', migrations, latencyMs: Math.round(performance.now() - started) } });
    } catch {
      // The pools reconnect by themselves once the database is back; this answer turns to 200 then.
      res.set('Retry-After', '5').status(503).json({ status: 'degraded', message: DATABASE_UNAVAILABLE, database: { state: 'down' } });
    }
  });
  return router;
}
