import { batchCasesBodySchema } from '../../../shared/schemas/batch';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { evaluateBatch } from './batch.service';

/** POST /api/batch/evaluate: onset cases in, onset results out (see shared/schemas/batch.ts). */
export function registerBatchRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'post',
    path: '/api/batch/evaluate',
    action: 'batch.evaluate',
    handler: async (req, res) => {
      const body = batchCasesBodySchema.parse(req.body);
      if (Array.isArray(body)) {
        res.json(await evaluateBatch(body));
      } else {
        res.json({ results: await evaluateBatch(body.cases) });
      }
    },
  });
}
