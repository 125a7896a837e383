import { auditListQuerySchema } from '../../../shared/schemas/audit';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { listAuditEvents } from './audit.repository';

export function registerAuditRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'get',
    path: '/api/audit',
    action: 'audit.list',
    handler: async (req, res, ctx) => {
      const query = auditListQuerySchema.parse(req.query);
      const { items, total } = await listAuditEvents(ctx.db, query);
      res.json({ items, total, page: query.page, pageSize: query.pageSize });
    },
  });
}
