import { pageQuerySchema } from '../../../shared/schemas/api-error';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { listOutboxMessages } from './outbox.repository';

export function registerOutboxRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'get',
    path: '/api/outbox',
    action: 'outbox.list',
    handler: async (req, res, ctx) => {
      const query = pageQuerySchema.parse(req.query);
      const { items, total } = await listOutboxMessages(ctx.db, query);
      res.json({ items, total, page: query.page, pageSize: query.pageSize });
    },
  });
}
