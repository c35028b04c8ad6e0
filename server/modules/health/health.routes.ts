import { Router } from 'express';
import type { Sequelize } from 'sequelize';

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
      res.status(503).json({ status: 'degraded', database: { state: 'down' } });
    }
  });
  return router;
}
