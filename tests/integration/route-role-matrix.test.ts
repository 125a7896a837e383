import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import express from 'express';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { isAllowed, policy, PUBLIC, ruleFor } from '../../server/auth/policy';
import { assertEveryApiRouteIsDefined, routeRegistry, type RegisteredRoute } from '../../server/http/define-route';
import { roleValues, type Role } from '../../shared/schemas/roles';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';

let ctx: TestContext;
const agents = new Map<Role, TestAgent>();

beforeAll(async () => {
  ctx = createTestContext(); // creating the app fills routeRegistry
  for (const role of roleValues) agents.set(role, await signedInAgent(ctx.app, await createTestUser(ctx.db, { role })));
});
afterAll(async () => {
  await ctx.close();
});

/** Fill path parameters with harmless values that match nothing. */
function concretePath(route: RegisteredRoute): string {
  return route.path.replace(/:id\b/g, randomUUID()).replace(/:token\b/g, 'x'.repeat(43)).replace(/:(\w+)/g, 'placeholder');
}

function send(agent: TestAgent | ReturnType<typeof request>, route: RegisteredRoute) {
  const path = concretePath(route);
  const call = agent[route.method](path);
  return route.method === 'get' || route.method === 'delete' ? call : call.send({});
}

describe('route/role matrix over every registered /api route', () => {
  const routes = () => [...routeRegistry.values()];

  it('has the foundation routes registered, each with an action from the policy', () => {
    const keys = routes().map((r) => `${r.method.toUpperCase()} ${r.path}`);
    for (const expected of [
      'GET /api/health',
      'GET /api/config/public',
      'POST /api/auth/sign-in',
      'POST /api/auth/sign-out',
      'GET /api/me',
      'POST /api/auth/password-reset/request',
      'POST /api/auth/password-reset/confirm',
      'GET /api/invitations/:token',
      'POST /api/invitations/accept',
      'GET /api/users',
      'POST /api/users/invitations',
      'PATCH /api/users/:id',
      'GET /api/audit',
      'GET /api/outbox',
    ]) {
      expect(keys).toContain(expected);
    }
    for (const route of routes()) expect(ruleFor(route.action)).toBeDefined();
  });

  it('answers 401 without a session on every non-public route', async () => {
    for (const route of routes().filter((r) => policy[r.action] !== PUBLIC)) {
      const response = await send(request(ctx.app), route);
      expect({ route: `${route.method} ${route.path}`, status: response.status }).toEqual({
        route: `${route.method} ${route.path}`,
        status: 401,
      });
      expect(response.body.error.code).toBe('unauthenticated');
    }
  });

  it('answers 403 for every role the policy does not list, and neither 401 nor 403 for the roles it does', async () => {
    let forbiddenChecks = 0;
    for (const route of routes()) {
      if (route.action === 'auth.sign-out' || route.action === 'auth.sign-in') continue; // would end or replace the agent's session
      if (route.action === 'gauge.device-post') continue; // authenticates by its own bearer token, not the session (tests/integration/gauge-log.test.ts)
      for (const role of roleValues) {
        const response = await send(agents.get(role)!, route);
        const label = `${role} ${route.method.toUpperCase()} ${route.path}`;
        if (isAllowed(route.action, role)) {
          expect([401, 403], `${label} → ${response.status}`).not.toContain(response.status);
        } else {
          forbiddenChecks += 1;
          expect(response.status, label).toBe(403);
          expect(response.body.error.code).toBe('forbidden');
        }
      }
    }
    // The administrator-only routes alone give 5 routes × 3 other roles.
    expect(forbiddenChecks).toBeGreaterThanOrEqual(15);
  });

  it('keeps the administrator-only actions administrator-only', () => {
    for (const action of ['users.list', 'users.invite', 'users.update', 'audit.list', 'outbox.list'] as const) {
      expect(roleValues.filter((role) => isAllowed(action, role))).toEqual(['administrator']);
    }
  });
});

describe('deny by default', () => {
  it('denies every role an action that is not in the policy', () => {
    for (const role of roleValues) expect(isAllowed('fluids.delete-everything', role)).toBe(false);
    expect(ruleFor('toString')).toBeUndefined(); // no prototype look-ups
  });

  it('refuses to start when an /api route bypasses defineRoute', () => {
    const app = express();
    app.get('/api/sneaky', (_req, res) => {
      res.json({ ok: true });
    });
    expect(() => assertEveryApiRouteIsDefined(app)).toThrow(/\/api\/sneaky/);

    const nested = express();
    const router = express.Router();
    router.get('/reports', (_req, res) => {
      res.json({});
    });
    nested.use('/api', router);
    expect(() => assertEveryApiRouteIsDefined(nested)).toThrow(/reports/);
  });

  it('accepts non-/api routes such as the client fallback', () => {
    const app = express();
    app.get('/{*splat}', (_req, res) => {
      res.send('client');
    });
    expect(() => assertEveryApiRouteIsDefined(app)).not.toThrow();
  });
});
