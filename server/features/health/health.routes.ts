import { sql } from 'drizzle-orm';
import { defineRoute, type ApiRouter } from '../../http/define-route';

export function registerHealthRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'get',
    path: '/api/health',
    action: 'health.read',
    handler: async (req, res, ctx) => {
      try {
        await ctx.db.execute(sql`select 1`);
        res.json({ status: 'ok', database: 'up' });
      } catch (error) {
        // Health answers with its own body (not the error shape) so probes can read it either way.
        req.log?.warn({ err: error }, 'health check: database down');
        res.status(503).json({ status: 'degraded', database: 'down' });
      }
    },
  });
}
