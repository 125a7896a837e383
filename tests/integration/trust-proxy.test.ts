/**
 * The sign-in throttle counts per client address. Behind a reverse proxy every request arrives from
 * the proxy, so TRUST_PROXY tells Express which X-Forwarded-For hops to believe. supertest connects
 * from 127.0.0.1, which stands in for the proxy here.
 */
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createTestContext } from './helpers/test-app';
import { uniqueEmail } from './helpers/users';

const tight = { signIn: { windowMs: 60_000, limit: 1 } };

async function signInFrom(app: Parameters<typeof request>[0], forwardedFor: string): Promise<number> {
  const response = await request(app)
    .post('/api/auth/sign-in')
    .set('X-Forwarded-For', forwardedFor)
    .send({ email: uniqueEmail('proxy'), password: 'whatever-it-is' });
  return response.status;
}

describe('TRUST_PROXY and the per-address sign-in throttle', () => {
  it('by default ignores X-Forwarded-For: two clients behind one proxy share its limit', async () => {
    const ctx = createTestContext({ rateLimits: tight });
    try {
      expect(await signInFrom(ctx.app, '198.51.100.1')).toBe(401);
      expect(await signInFrom(ctx.app, '198.51.100.2')).toBe(429);
    } finally {
      await ctx.close();
    }
  });

  it('with the proxy trusted, counts each forwarded client on its own', async () => {
    const ctx = createTestContext({ rateLimits: tight, env: { TRUST_PROXY: 'loopback' } });
    try {
      expect(await signInFrom(ctx.app, '198.51.100.1')).toBe(401);
      expect(await signInFrom(ctx.app, '198.51.100.2')).toBe(401);
      expect(await signInFrom(ctx.app, '198.51.100.1')).toBe(429);
    } finally {
      await ctx.close();
    }
  });
});
