import { Router } from 'express';
import type { z } from 'zod';
import { idParamSchema } from '../../shared/schemas/common';
import { ANY_ROLE, OFFICE_ROLES, requireRole } from '../auth/require-role';
import { valid, validate } from './validate';

interface ResourceDefinition<Q extends z.ZodType, C extends z.ZodType, U extends z.ZodType> {
  listQuery: Q;
  createBody: C;
  updateBody: U;
  search: (q: z.infer<Q>) => Promise<unknown>;
  get: (id: number) => Promise<unknown>;
  create: (input: z.infer<C>) => Promise<unknown>;
  update: (id: number, input: z.infer<U>) => Promise<unknown>;
}

/**
 * The reference-record routes (customers, sites, presses): every signed-in role reads;
 * managers and admins create and update.
 */
export function resourceRoutes<Q extends z.ZodType, C extends z.ZodType, U extends z.ZodType>(def: ResourceDefinition<Q, C, U>): Router {
  const router = Router();
  const readers = requireRole(...ANY_ROLE);
  const writers = requireRole(...OFFICE_ROLES);

  router.get('/', readers, validate('query', def.listQuery), async (req, res) => {
    res.json(await def.search(valid(req, 'query', def.listQuery)));
  });

  router.get('/:id', readers, validate('params', idParamSchema), async (req, res) => {
    res.json(await def.get(valid(req, 'params', idParamSchema).id));
  });

  router.post('/', writers, validate('body', def.createBody), async (req, res) => {
    res.status(201).json(await def.create(valid(req, 'body', def.createBody)));
  });

  router.patch('/:id', writers, validate('params', idParamSchema), validate('body', def.updateBody), async (req, res) => {
    res.json(await def.update(valid(req, 'params', idParamSchema).id, valid(req, 'body', def.updateBody)));
  });

  return router;
}
