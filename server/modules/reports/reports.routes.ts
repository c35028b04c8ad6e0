import { Router, type RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { AppError } from '../../lib/errors';
import { valid, validate } from '../../lib/validate';
import { acknowledgeSchema, reportThumbParamsSchema, reportTokenParamsSchema } from './reports.schema';
import { acknowledgeReport, getPublicReport, getPublicReportPdf, getPublicThumb } from './reports.service';

/**
 * Mounted at /api/report: the customer's read-only report, opened with the signed link from the
 * e-mail. No session: the link is the only key, and every bad link gets the same refusal.
 */
export function reportRoutes(): Router {
  const router = Router();
  // A page with its thumbnails is a dozen requests; guessing links needs many thousands.
  const limiter: RequestHandler = rateLimit({
    windowMs: 10 * 60_000,
    limit: 600,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError(429, 'too_many_requests', 'Too many requests for reports from this network. Wait a few minutes and open the link again.')),
  });
  router.use(limiter);
  // The report is the customer's: shared caches and search engines keep none of it.
  router.use((_req, res, next) => {
    res.set({ 'Cache-Control': 'private, no-store', 'X-Robots-Tag': 'noindex', 'Referrer-Policy': 'no-referrer' });
    next();
  });
  const token = validate('params', reportTokenParamsSchema);
  const tokenOf = (req: Parameters<typeof valid>[0]) => valid(req, 'params', reportTokenParamsSchema).token;

  router.get('/:token', token, async (req, res) => {
    res.json(await getPublicReport(tokenOf(req)));
  });

  router.get('/:token/pdf', token, async (req, res) => {
    const { fileName, pdf } = await getPublicReportPdf(tokenOf(req));
    res.set({ 'Content-Type': 'application/pdf', 'Content-Disposition': `inline; filename="${fileName}"`, 'Content-Length': String(pdf.length) });
    res.end(pdf);
  });

  router.get('/:token/photos/:attachmentId/thumb', validate('params', reportThumbParamsSchema), async (req, res) => {
    const { token: t, attachmentId } = valid(req, 'params', reportThumbParamsSchema);
    const bytes = await getPublicThumb(t, attachmentId);
    res.set({ 'Content-Type': 'image/jpeg', 'Content-Length': String(bytes.length), 'X-Content-Type-Options': 'nosniff' });
    res.end(bytes);
  });

  router.post('/:token/acknowledge', token, validate('body', acknowledgeSchema), async (req, res) => {
    res.json({ acknowledgement: await acknowledgeReport(tokenOf(req), valid(req, 'body', acknowledgeSchema).name) });
  });

  return router;
}
