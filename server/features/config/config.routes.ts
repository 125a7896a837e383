import type { PublicConfig } from '../../../shared/schemas/auth';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts';

export function registerConfigRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'get',
    path: '/api/config/public',
    action: 'config.read',
    handler: (_req, res, ctx) => {
      // Demo sign-ins are shown only in demo mode, and never when NODE_ENV says production.
      const demoMode = ctx.env.QUIETLAYER_MODE === 'demo' && ctx.env.NODE_ENV !== 'production';
      const body: PublicConfig = {
        demoMode,
        demoSignIns: demoMode ? DEMO_ACCOUNTS.map(({ email, role }) => ({ email, role, password: DEMO_PASSWORD })) : [],
      };
      res.json(body);
    },
  });
}
