import { z } from 'zod';
import { runSpreadInputSchema } from '../../../shared/schemas/property-spreads';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { spreadQueue } from '../../jobs/spread-queue-registry';
import { getPropertySpread, listPropertySpreads, startPropertySpread } from './property-spreads.service';

const idParamsSchema = z.object({ id: z.uuid({ error: 'id must be an id' }) });

/** Property spread routes (see shared/schemas/property-spreads.ts). */
export function registerPropertySpreadsRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'post',
    path: '/api/layer-checks/:id/spreads',
    action: 'propertySpreads.run',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      const body = runSpreadInputSchema.parse(req.body);
      const queue = spreadQueue();
      const spread = await startPropertySpread(ctx.db, ctx.user, id, body, { enqueue: queue?.enqueue, requestId: ctx.requestId });
      res.status(spread.status === 'done' ? 201 : 202).json(spread);
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/layer-checks/:id/spreads',
    action: 'propertySpreads.read',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      res.json({ items: await listPropertySpreads(ctx.db, id) });
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/property-spreads/:id',
    action: 'propertySpreads.read',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      res.json(await getPropertySpread(ctx.db, id));
    },
  });
}
