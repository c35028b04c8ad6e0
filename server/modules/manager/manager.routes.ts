import { Router } from 'express';
import { idParamSchema } from '../../../shared/schemas/common';
import { figuresQuerySchema } from '../../../shared/schemas/manager-figures';
import { visitTableFilterSchema, visitTableQuerySchema } from '../../../shared/schemas/visit-table';
import { OFFICE_ROLES, requireRole } from '../../auth/require-role';
import { logger } from '../../lib/logger';
import { valid, validate } from '../../lib/validate';
import { managerFigures } from './figures.service';
import { getOfficeVisitRecord } from '../reports/reports.service';
import { auditTrail, technicianOptions, visitTable } from './manager.service';
import { pressHistory } from './press-history.service';
import { assertDatabaseTimeZone } from './time-zones';
import { visitCsvChunks } from './visit-export';

/** The service manager's screens: all visits, the export, figures, press history, a visit's record and audit trail. */
export function managerRoutes(): Router {
  const router = Router();
  router.use(requireRole(...OFFICE_ROLES));
  const id = validate('params', idParamSchema);

  router.get('/visits', validate('query', visitTableQuerySchema), async (req, res) => {
    const query = valid(req, 'query', visitTableQuerySchema);
    await assertDatabaseTimeZone(query.tz);
    res.json(await visitTable(query));
  });

  // Streamed: each batch is written as it arrives, and writing waits while the client catches up.
  // The whole query is checked, and the first batch read, before the first byte: a refusal or a
  // failing query is still an ordinary JSON error, not a 200 cut short.
  router.get('/visits/export.csv', validate('query', visitTableFilterSchema), async (req, res) => {
    const filter = valid(req, 'query', visitTableFilterSchema);
    await assertDatabaseTimeZone(filter.tz);
    const chunks = visitCsvChunks(filter);
    const first = await chunks.next();
    const day = new Date().toISOString().slice(0, 10);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="crankwise-visits-${day}.csv"`);
    res.setHeader('Cache-Control', 'no-store');
    try {
      for (let next = first; !next.done; next = await chunks.next()) {
        const chunk = next.value;
        if (res.destroyed) {
          await chunks.return(undefined); // the person cancelled the download: stop querying
          return;
        }
        if (!res.write(chunk)) await new Promise<void>((resolve) => res.once('drain', resolve).once('close', resolve));
      }
      res.end();
    } catch (err) {
      if (!res.headersSent) throw err;
      // Half a file must not look like a whole one: once rows are sent, only a cut connection says "failed".
      logger.error({ err }, 'visit export failed part-way');
      res.destroy(err as Error);
    }
  });

  // The visit record as the office reads it: the same model as the customer's report, plus the review comment.
  router.get('/visits/:id/record', id, async (req, res) => {
    res.json(await getOfficeVisitRecord(valid(req, 'params', idParamSchema).id));
  });

  router.get('/visits/:id/audit', id, async (req, res) => {
    res.json(await auditTrail(req.user!, valid(req, 'params', idParamSchema).id));
  });

  router.get('/technicians', async (_req, res) => {
    res.json({ items: await technicianOptions() });
  });

  router.get('/figures', validate('query', figuresQuerySchema), async (req, res) => {
    const query = valid(req, 'query', figuresQuerySchema);
    await assertDatabaseTimeZone(query.tz);
    res.json(await managerFigures(query));
  });

  router.get('/presses/:id/history', id, async (req, res) => {
    res.json(await pressHistory(valid(req, 'params', idParamSchema).id));
  });

  return router;
}
