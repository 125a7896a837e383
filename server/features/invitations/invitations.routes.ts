import { z } from 'zod';
import { invitationAcceptInputSchema } from '../../../shared/schemas/auth';
import { startFreshSession } from '../../auth/session';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { createAddressRateLimit } from '../../http/rate-limit';
import { acceptInvitation, previewInvitation } from './invitations.service';

const tokenParamsSchema = z.object({ token: z.string().min(20, 'token is malformed').max(200, 'token is malformed') });

export function registerInvitationsRoutes(api: ApiRouter): void {
  const tokenLimit = createAddressRateLimit(api.deps, 'tokenUse');

  defineRoute(api, {
    method: 'get',
    path: '/api/invitations/:token',
    action: 'invitations.preview',
    before: [tokenLimit],
    handler: async (req, res, ctx) => {
      const { token } = tokenParamsSchema.parse(req.params);
      res.json(await previewInvitation(ctx.db, token));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/invitations/accept',
    action: 'invitations.accept',
    before: [tokenLimit],
    handler: async (req, res, ctx) => {
      const input = invitationAcceptInputSchema.parse(req.body);
      const user = await acceptInvitation(ctx.db, ctx.env, input, { requestId: ctx.requestId });
      await startFreshSession(ctx.session, user.id);
      res.json({ user });
    },
  });
}
