import { Router } from 'express';
import { procedureImportSchema } from '../../../shared/schemas/admin-reference';
import { idParamSchema } from '../../../shared/schemas/common';
import { valid, validate } from '../../lib/validate';
import { checkProcedure, discardProcedure, getProcedure, importProcedure, listProcedures, publishProcedure, rejection } from './procedures.service';

export function adminProcedureRoutes(): Router {
  const router = Router();
  const id = validate('params', idParamSchema);
  const idOf = (req: Parameters<typeof valid>[0]) => valid(req, 'params', idParamSchema).id;

  router.get('/', async (_req, res) => {
    res.json(await listProcedures());
  });
  // Validator messages and the diagram, without saving anything.
  router.post('/check', validate('body', procedureImportSchema.pick({ definition: true })), (req, res) => {
    res.json(checkProcedure(valid(req, 'body', procedureImportSchema).definition));
  });
  router.post('/', validate('body', procedureImportSchema), async (req, res) => {
    const result = await importProcedure(req.user!, valid(req, 'body', procedureImportSchema));
    if ('problems' in result) {
      res.status(422).json(rejection(result));
      return;
    }
    res.status(201).json(result);
  });
  router.get('/:id', id, async (req, res) => {
    res.json(await getProcedure(idOf(req)));
  });
  router.post('/:id/publish', id, async (req, res) => {
    res.json(await publishProcedure(req.user!, idOf(req)));
  });
  router.delete('/:id', id, async (req, res) => {
    await discardProcedure(req.user!, idOf(req));
    res.status(204).end();
  });
  return router;
}
