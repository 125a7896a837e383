import { z } from 'zod';
import { dryingPathInputSchema, saveDryingSetupInputSchema } from '../../../shared/schemas/drying-paths';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { evaluateDryingPath, getDryingSetup, listDryingSetups, saveDryingSetup } from './drying-paths.service';

const idParamsSchema = z.object({ id: z.uuid({ error: 'id must be an id' }) });

/** Drying path routes (see shared/schemas/drying-paths.ts). */
export function registerDryingPathsRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'post',
    path: '/api/drying-paths/evaluate',
    action: 'dryingPaths.evaluate',
    handler: async (req, res) => {
      const input = dryingPathInputSchema.parse(req.body);
      res.json(evaluateDryingPath(input));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/layer-checks/:id/drying-setups',
    action: 'dryingPaths.read',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      res.json({ items: await listDryingSetups(ctx.db, id) });
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/layer-checks/:id/drying-setups',
    action: 'dryingPaths.write',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      const body = saveDryingSetupInputSchema.parse(req.body);
      res.status(201).json(await saveDryingSetup(ctx.db, ctx.user, id, body, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/drying-setups/:id',
    action: 'dryingPaths.read',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      res.json(await getDryingSetup(ctx.db, id));
    },
  });
}
