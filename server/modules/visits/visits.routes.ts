import { Router } from 'express';
import { idParamSchema } from '../../../shared/schemas/common';
import {
  cancelVisitSchema,
  closeOutSchema,
  readingSaveSchema,
  reviewDecisionSchema,
  stepAnswerInputSchema,
  visitCreateSchema,
  visitListQuerySchema,
  visitStepParamsSchema,
} from '../../../shared/schemas/visit';
import { ANY_ROLE, OFFICE_ROLES, requireRole } from '../../auth/require-role';
import { valid, validate } from '../../lib/validate';
import { saveReading } from './readings.service';
import { answerStep } from './step-answers.service';
import { getReportDelivery, type ReportDeliveryLookup } from './report-delivery.service';
import { cancelVisit, closeVisit, reopenVisit, reviewVisit } from './visit-status.service';
import { createVisit, getVisitDetail, listVisits } from './visits.service';

/** `reportDelivery` comes from the reports module through createApp, so visits does not import it (no module cycle). */
export function visitRoutes({ reportDelivery }: { reportDelivery: ReportDeliveryLookup }): Router {
  const router = Router();
  const anyone = requireRole(...ANY_ROLE);
  const id = validate('params', idParamSchema);
  const visitId = (req: Parameters<typeof valid>[0]) => valid(req, 'params', idParamSchema).id;

  router.get('/', anyone, validate('query', visitListQuerySchema), async (req, res) => {
    res.json(await listVisits(req.user!, valid(req, 'query', visitListQuerySchema)));
  });

  router.post('/', anyone, validate('body', visitCreateSchema), async (req, res) => {
    res.status(201).json(await createVisit(req.user!, valid(req, 'body', visitCreateSchema)));
  });

  router.get('/:id', anyone, id, async (req, res) => {
    res.json(await getVisitDetail(req.user!, visitId(req)));
  });

  router.put('/:id/steps/:stepId', anyone, validate('params', visitStepParamsSchema), validate('body', stepAnswerInputSchema), async (req, res) => {
    const params = valid(req, 'params', visitStepParamsSchema);
    res.json(await answerStep(req.user!, params.id, params.stepId, valid(req, 'body', stepAnswerInputSchema)));
  });

  router.post('/:id/readings', anyone, id, validate('body', readingSaveSchema), async (req, res) => {
    res.json(await saveReading(req.user!, visitId(req), valid(req, 'body', readingSaveSchema)));
  });

  router.post('/:id/close', anyone, id, validate('body', closeOutSchema), async (req, res) => {
    res.json(await closeVisit(req.user!, visitId(req), valid(req, 'body', closeOutSchema)));
  });

  router.post('/:id/cancel', anyone, id, validate('body', cancelVisitSchema), async (req, res) => {
    res.json(await cancelVisit(req.user!, visitId(req), valid(req, 'body', cancelVisitSchema)));
  });

  router.get('/:id/report-delivery', anyone, id, async (req, res) => {
    res.json({ delivery: await getReportDelivery(req.user!, visitId(req), reportDelivery) });
  });

  router.post('/:id/reopen', anyone, id, async (req, res) => {
    res.json(await reopenVisit(req.user!, visitId(req)));
  });

  router.post('/:id/review', requireRole(...OFFICE_ROLES), id, validate('body', reviewDecisionSchema), async (req, res) => {
    res.json(await reviewVisit(req.user!, visitId(req), valid(req, 'body', reviewDecisionSchema)));
  });

  return router;
}
