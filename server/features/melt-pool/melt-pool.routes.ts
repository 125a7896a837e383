import { z } from 'zod';
import { heatInputSchema, heatListQuerySchema, meltPoolInputSchema, saveMeltPoolSetupInputSchema, updateHeatInputSchema } from '../../../shared/schemas/melt-pool';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { createHeat, getHeat, listHeats, removeHeat, updateHeat } from './heats.service';
import { evaluateMeltPool, listMeltPoolSetups, saveMeltPoolSetup } from './melt-pool.service';

const idParamsSchema = z.object({ id: z.uuid({ error: 'id must be an id' }) });

/** Melt pool flow, the heats register and melt-pool set-ups (see shared/schemas/melt-pool.ts). */
export function registerMeltPoolRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'post',
    path: '/api/melt-pool/evaluate',
    action: 'meltPool.evaluate',
    handler: async (req, res) => {
      res.json(evaluateMeltPool(meltPoolInputSchema.parse(req.body)));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/heats',
    action: 'heats.read',
    handler: async (req, res, ctx) => {
      const query = heatListQuerySchema.parse(req.query);
      const { items, total } = await listHeats(ctx.db, query);
      res.json({ items, total, page: query.page, pageSize: query.pageSize });
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/heats',
    action: 'heats.write',
    handler: async (req, res, ctx) => {
      const body = heatInputSchema.parse(req.body);
      res.status(201).json(await createHeat(ctx.db, ctx.user, body, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/heats/:id',
    action: 'heats.read',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      res.json(await getHeat(ctx.db, id));
    },
  });

  defineRoute(api, {
    method: 'put',
    path: '/api/heats/:id',
    action: 'heats.write',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      const body = updateHeatInputSchema.parse(req.body);
      res.json(await updateHeat(ctx.db, ctx.user, id, body, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'delete',
    path: '/api/heats/:id',
    action: 'heats.write',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      await removeHeat(ctx.db, ctx.user, id, { requestId: ctx.requestId });
      res.status(204).end();
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/layer-checks/:id/melt-pool',
    action: 'meltPool.read',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      res.json({ items: await listMeltPoolSetups(ctx.db, id) });
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/layer-checks/:id/melt-pool',
    action: 'meltPool.write',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      const body = saveMeltPoolSetupInputSchema.parse(req.body);
      res.status(201).json(await saveMeltPoolSetup(ctx.db, ctx.user, id, body, { requestId: ctx.requestId }));
    },
  });
}
