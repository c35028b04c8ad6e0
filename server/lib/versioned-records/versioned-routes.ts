import { Router } from 'express';
import type { Model } from 'sequelize';
import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/common';
import { valid, validate } from '../validate';
import { isBodyDraft, versionedService, type VersionedResource, type VersionedRow } from './versioned-service';

/**
 * The routes of a versioned resource (mounted under its own path, roles checked by the mount):
 * GET / (list) · POST drafts · GET /:id · PUT /:id (when `save`) · POST /:id/publish · DELETE /:id.
 * A draft is created by POST /drafts, POST /<family path>/:<family>/drafts, or, for a body draft,
 * POST / (201, or 422 with the resource's rejection). `extend` adds a resource's own routes first.
 */
export function versionedRoutes<M extends Model & VersionedRow, R, L, S extends z.ZodType, P extends z.ZodType>(
  spec: VersionedResource<M, R, L, S, P>,
  extend?: (router: Router) => void,
): Router {
  const service = versionedService(spec);
  const router = Router();
  const id = validate('params', idParamSchema);
  const idOf = (req: Parameters<typeof valid>[0]) => valid(req, 'params', idParamSchema).id;

  extend?.(router);
  router.get('/', async (_req, res) => {
    res.json(await service.list());
  });

  const { draft, family, save } = spec;
  if (isBodyDraft(draft)) {
    router.post('/', validate('body', draft.schema), async (req, res) => {
      const result = await service.bodyDraft(req.user!, valid(req, 'body', draft.schema));
      if ('rejected' in result) res.status(422).json(result.rejected);
      else res.status(201).json(result.record);
    });
  } else if (family) {
    if (!family.path || !family.schema) throw new Error(`${spec.what}: a family with copied drafts needs the path and schema of its drafts route`);
    const params = z.object({ [family.column]: family.schema });
    router.post(`/${family.path}/:${family.column}/drafts`, validate('params', params), async (req, res) => {
      const value = (valid(req, 'params', params) as Record<string, string>)[family.column]!;
      res.status(201).json(await service.copyDraft(req.user!, value));
    });
  } else {
    router.post('/drafts', async (req, res) => {
      res.status(201).json(await service.copyDraft(req.user!, null));
    });
  }

  router.get('/:id', id, async (req, res) => {
    res.json(await service.get(idOf(req)));
  });
  if (save) {
    router.put('/:id', id, validate('body', save.schema), async (req, res) => {
      res.json(await service.save(idOf(req), save.content(valid(req, 'body', save.schema))));
    });
  }
  router.post('/:id/publish', id, async (req, res) => {
    res.json(await service.publish(req.user!, idOf(req)));
  });
  router.delete('/:id', id, async (req, res) => {
    await service.discard(req.user!, idOf(req));
    res.status(204).end();
  });
  return router;
}
