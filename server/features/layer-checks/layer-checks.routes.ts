import { z } from 'zod';
import {
  evaluateLayerCheckInputSchema,
  layerCheckInputSchema,
  layerCheckListQuerySchema,
  postQuietWindowInputSchema,
  quietWindowQuerySchema,
  updateLayerCheckInputSchema,
} from '../../../shared/schemas/layer-checks';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { answeringStaleVersion } from '../fluids/fluids.routes';
import {
  createLayerCheck,
  evaluateLayerCheckBody,
  evaluateSavedLayerCheck,
  getLayerCheck,
  listLayerCheckRevisions,
  listLayerChecks,
  quietWindowOfBody,
  quietWindowOfCheck,
  updateLayerCheck,
} from './layer-checks.service';

const checkIdParamsSchema = z.object({ id: z.uuid({ error: 'id must be a layer check id' }) });

/** Layer check routes (see shared/schemas/layer-checks.ts for bodies and answers). */
export function registerLayerChecksRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'get',
    path: '/api/layer-checks',
    action: 'layerChecks.read',
    handler: async (req, res, ctx) => {
      const query = layerCheckListQuerySchema.parse(req.query);
      const { items, total } = await listLayerChecks(ctx.db, query);
      res.json({ items, total, page: query.page, pageSize: query.pageSize });
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/layer-checks/evaluate',
    action: 'layerChecks.evaluate',
    handler: async (req, res, ctx) => {
      const body = evaluateLayerCheckInputSchema.parse(req.body);
      res.json(await evaluateLayerCheckBody(ctx.db, body));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/layer-checks/window',
    action: 'layerChecks.evaluate',
    handler: async (req, res, ctx) => {
      const { check, window } = postQuietWindowInputSchema.parse(req.body);
      res.json(await quietWindowOfBody(ctx.db, check, quietWindowQuerySchema.parse(window ?? {})));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/layer-checks',
    action: 'layerChecks.write',
    handler: async (req, res, ctx) => {
      const input = layerCheckInputSchema.parse(req.body);
      res.status(201).json(await createLayerCheck(ctx.db, ctx.user, input, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/layer-checks/:id',
    action: 'layerChecks.read',
    handler: async (req, res, ctx) => {
      const { id } = checkIdParamsSchema.parse(req.params);
      res.json(await getLayerCheck(ctx.db, id));
    },
  });

  defineRoute(api, {
    method: 'put',
    path: '/api/layer-checks/:id',
    action: 'layerChecks.write',
    handler: async (req, res, ctx) => {
      const { id } = checkIdParamsSchema.parse(req.params);
      const body = updateLayerCheckInputSchema.parse(req.body);
      await answeringStaleVersion(res, async () => {
        res.json(await updateLayerCheck(ctx.db, ctx.user, id, body, { requestId: ctx.requestId }));
      });
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/layer-checks/:id/revisions',
    action: 'layerChecks.read',
    handler: async (req, res, ctx) => {
      const { id } = checkIdParamsSchema.parse(req.params);
      res.json({ items: await listLayerCheckRevisions(ctx.db, id) });
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/layer-checks/:id/evaluation',
    action: 'layerChecks.read',
    handler: async (req, res, ctx) => {
      const { id } = checkIdParamsSchema.parse(req.params);
      res.json(await evaluateSavedLayerCheck(ctx.db, id));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/layer-checks/:id/window',
    action: 'layerChecks.read',
    handler: async (req, res, ctx) => {
      const { id } = checkIdParamsSchema.parse(req.params);
      res.json(await quietWindowOfCheck(ctx.db, id, quietWindowQuerySchema.parse(req.query)));
    },
  });
}
