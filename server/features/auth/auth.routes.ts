import {
  passwordResetConfirmInputSchema,
  passwordResetRequestInputSchema,
  signInInputSchema,
} from '../../../shared/schemas/auth';
import { startFreshSession } from '../../auth/session';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { createAddressRateLimit } from '../../http/rate-limit';
import { confirmPasswordReset, endSession, requestPasswordReset, signIn } from './auth.service';

export function registerAuthRoutes(api: ApiRouter): void {
  const signInLimit = createAddressRateLimit(api.deps, 'signIn');
  const tokenLimit = createAddressRateLimit(api.deps, 'tokenUse');

  defineRoute(api, {
    method: 'post',
    path: '/api/auth/sign-in',
    action: 'auth.sign-in',
    before: [signInLimit],
    handler: async (req, res, ctx) => {
      const input = signInInputSchema.parse(req.body);
      const user = await signIn(ctx.db, ctx.env, input, { requestId: ctx.requestId });
      await startFreshSession(ctx.session, user.id);
      res.json({ user });
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/auth/sign-out',
    action: 'auth.sign-out',
    handler: async (_req, res, ctx) => {
      // Recorded before the cookie is cleared: if the database cannot be reached the answer is 503
      // and the browser keeps its cookie, so signing out can be tried again rather than only
      // seeming to work while a copied cookie stays valid.
      await endSession(ctx.db, ctx.env, ctx.session, { requestId: ctx.requestId });
      ctx.session.destroy();
      res.status(204).end();
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/me',
    action: 'me.read',
    handler: (_req, res, ctx) => {
      res.json({ user: ctx.user });
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/auth/password-reset/request',
    action: 'auth.password-reset.request',
    before: [tokenLimit],
    handler: async (req, res, ctx) => {
      const { email } = passwordResetRequestInputSchema.parse(req.body);
      await requestPasswordReset(ctx.db, ctx.env, email, { requestId: ctx.requestId });
      res.status(202).json({ message: 'If an account uses that e-mail address, a link to set a new password is on its way.' });
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/auth/password-reset/confirm',
    action: 'auth.password-reset.confirm',
    before: [tokenLimit],
    handler: async (req, res, ctx) => {
      const input = passwordResetConfirmInputSchema.parse(req.body);
      await confirmPasswordReset(ctx.db, ctx.env, input, { requestId: ctx.requestId });
      ctx.session.destroy();
      res.status(204).end();
    },
  });
}
