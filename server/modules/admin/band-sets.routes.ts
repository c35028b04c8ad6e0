import { Router } from 'express';
import { bandSetDraftSchema, generationParamSchema } from '../../../shared/schemas/admin-reference';
import { idParamSchema } from '../../../shared/schemas/common';
import { valid, validate } from '../../lib/validate';
import { discardBandSet, draftBandSet, getBandSet, listBandSetGenerations, publishBandSet, saveBandSetDraft } from './band-sets.service';

export function adminBandSetRoutes(): Router {
  const router = Router();
  const id = validate('params', idParamSchema);
  const idOf = (req: Parameters<typeof valid>[0]) => valid(req, 'params', idParamSchema).id;

  router.get('/', async (_req, res) => {
    res.json(await listBandSetGenerations());
  });
  router.post('/generations/:generation/drafts', validate('params', generationParamSchema), async (req, res) => {
    res.status(201).json(await draftBandSet(req.user!, valid(req, 'params', generationParamSchema).generation));
  });
  router.get('/:id', id, async (req, res) => {
    res.json(await getBandSet(idOf(req)));
  });
  router.put('/:id', id, validate('body', bandSetDraftSchema), async (req, res) => {
    res.json(await saveBandSetDraft(idOf(req), valid(req, 'body', bandSetDraftSchema).bands));
  });
  router.post('/:id/publish', id, async (req, res) => {
    res.json(await publishBandSet(req.user!, idOf(req)));
  });
  router.delete('/:id', id, async (req, res) => {
    await discardBandSet(req.user!, idOf(req));
    res.status(204).end();
  });
  return router;
}
