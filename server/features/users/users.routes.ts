import { z } from 'zod';
import { inviteUserInputSchema, updateUserInputSchema, userListQuerySchema } from '../../../shared/schemas/users';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { inviteUser, listUsers, updateUser } from './users.service';

const userIdParamsSchema = z.object({ id: z.uuid({ error: 'id must be a user id' }) });

export function registerUsersRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'get',
    path: '/api/users',
    action: 'users.list',
    handler: async (req, res, ctx) => {
      const query = userListQuerySchema.parse(req.query);
      const { items, total } = await listUsers(ctx.db, query);
      res.json({ items, total, page: query.page, pageSize: query.pageSize });
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/users/invitations',
    action: 'users.invite',
    handler: async (req, res, ctx) => {
      const input = inviteUserInputSchema.parse(req.body);
      const invitation = await inviteUser(ctx.db, ctx.env, ctx.user, input, { requestId: ctx.requestId });
      res.status(201).json(invitation);
    },
  });

  defineRoute(api, {
    method: 'patch',
    path: '/api/users/:id',
    action: 'users.update',
    handler: async (req, res, ctx) => {
      const { id } = userIdParamsSchema.parse(req.params);
      const input = updateUserInputSchema.parse(req.body);
      const user = await updateUser(ctx.db, ctx.user, id, input, { requestId: ctx.requestId });
      res.json(user);
    },
  });
}
