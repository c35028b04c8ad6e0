import { Router } from 'express';
import { firmwareRulesDraftSchema } from '../../../shared/schemas/admin-reference';
import { idParamSchema } from '../../../shared/schemas/common';
import { valid, validate } from '../../lib/validate';
import { discardFirmwareRules, draftFirmwareRules, getFirmwareRuleSet, listFirmwareRuleSets, publishFirmwareRules, saveFirmwareRulesDraft } from './firmware-rules.service';

export function adminFirmwareRuleRoutes(): Router {
  const router = Router();
  const id = validate('params', idParamSchema);
  const idOf = (req: Parameters<typeof valid>[0]) => valid(req, 'params', idParamSchema).id;

  router.get('/', async (_req, res) => {
    res.json(await listFirmwareRuleSets());
  });
  router.post('/drafts', async (req, res) => {
    res.status(201).json(await draftFirmwareRules(req.user!));
  });
  router.get('/:id', id, async (req, res) => {
    res.json(await getFirmwareRuleSet(idOf(req)));
  });
  router.put('/:id', id, validate('body', firmwareRulesDraftSchema), async (req, res) => {
    res.json(await saveFirmwareRulesDraft(idOf(req), valid(req, 'body', firmwareRulesDraftSchema).rules));
  });
  router.post('/:id/publish', id, async (req, res) => {
    res.json(await publishFirmwareRules(req.user!, idOf(req)));
  });
  router.delete('/:id', id, async (req, res) => {
    await discardFirmwareRules(req.user!, idOf(req));
    res.status(204).end();
  });
  return router;
}
