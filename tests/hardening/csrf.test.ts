/**
 * Cross-site request forgery: cookie-authenticated changes are refused (403 'csrf') when the browser
 * says they come from another site. Method from the OWASP Cheat Sheet Series, "Cross-Site Request
 * Forgery Prevention" (verifying origin with standard headers; Fetch Metadata `Sec-Fetch-Site`).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { createTestContext, type TestContext } from '../integration/helpers/test-app';
import { createTestUser, signedInAgent, uniqueEmail, type TestUser } from '../integration/helpers/users';

let ctx: TestContext;
let admin: TestUser;
let agent: TestAgent;
// createTestContext sets PUBLIC_URL=http://quietlayer.test.
const OWN = 'http://quietlayer.test';

beforeAll(async () => {
  ctx = createTestContext();
  admin = await createTestUser(ctx.db, { role: 'administrator' });
  agent = await signedInAgent(ctx.app, admin);
});
afterAll(async () => {
  await ctx.close();
});

const invite = () => ({ email: uniqueEmail('csrf'), displayName: 'Cross Site Probe', role: 'technician' });

describe('Origin / Referer / Sec-Fetch-Site check on state changes', () => {
  it('refuses a cookie-authenticated POST whose Origin is another site, and writes nothing', async () => {
    const body = invite();
    const response = await agent.post('/api/users/invitations').set('Origin', 'https://evil.example').send(body);
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('csrf');
    const list = await agent.get('/api/users').query({ q: body.email });
    expect(list.body.total).toBe(0);
  });

  it('refuses Origin: null (sandboxed frames, data: pages) and a look-alike host', async () => {
    for (const origin of ['null', 'http://quietlayer.test.evil.example', 'https://quietlayer.test', 'http://quietlayer.test:8080']) {
      const response = await agent.patch(`/api/users/${admin.id}`).set('Origin', origin).send({ displayName: 'Renamed by forgery' });
      expect({ origin, status: response.status, code: response.body.error?.code }).toEqual({ origin, status: 403, code: 'csrf' });
    }
  });

  it('refuses when Sec-Fetch-Site is cross-site even with no Origin', async () => {
    const response = await agent.post('/api/users/invitations').set('Sec-Fetch-Site', 'cross-site').send(invite());
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('csrf');
  });

  it('falls back to Referer when Origin is absent', async () => {
    const foreign = await agent.post('/api/users/invitations').set('Referer', 'https://evil.example/page').send(invite());
    expect(foreign.status).toBe(403);
    const own = await agent.post('/api/users/invitations').set('Referer', `${OWN}/admin/users`).send(invite());
    expect(own.status).toBe(201);
  });

  it('accepts the app’s own origin (PUBLIC_URL), the Host the request was sent to, and same-origin fetch metadata', async () => {
    const viaPublicUrl = await agent.post('/api/users/invitations').set('Origin', OWN).set('Sec-Fetch-Site', 'same-origin').send(invite());
    expect(viaPublicUrl.status).toBe(201);
    const viaHost = await agent.post('/api/users/invitations').set('Host', 'intranet.larkspur.example').set('Origin', 'http://intranet.larkspur.example').send(invite());
    expect(viaHost.status).toBe(201);
  });

  it('also stops a forged sign-in (login forgery) from another site', async () => {
    const response = await request(ctx.app).post('/api/auth/sign-in').set('Origin', 'https://evil.example').send({ email: admin.email, password: admin.password });
    expect(response.status).toBe(403);
    expect(response.headers['set-cookie']).toBeUndefined();
  });

  it('leaves reads alone and exempts bearer-token clients (no cookie is involved)', async () => {
    const read = await agent.get('/api/users').set('Origin', 'https://evil.example').set('Sec-Fetch-Site', 'cross-site');
    expect(read.status).toBe(200);
    // A bearer request passes the origin check and is then judged by its route (here: no session → 401).
    const bearer = await request(ctx.app)
      .post('/api/users/invitations')
      .set('Authorization', 'Bearer some-device-token')
      .set('Origin', 'https://evil.example')
      .send(invite());
    expect(bearer.status).toBe(401);
  });
});

describe('session fixation', () => {
  it('a cookie planted before sign-in is not honoured after it; the fresh one is', async () => {
    const user = await createTestUser(ctx.db, { role: 'technician' });
    // The attacker obtains a well-formed session cookie (here: the cleared one from sign-out, and one from a failed sign-in).
    const planted = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: 'wrong-password-here' });
    expect(planted.status).toBe(401);
    const anon = await request(ctx.app).get('/api/config/public');
    const plantedCookie = [anon.headers['set-cookie'], planted.headers['set-cookie']].flat().find((c) => typeof c === 'string' && c.startsWith('quietlayer_session='));
    const fixed = plantedCookie ? plantedCookie.split(';')[0] : 'quietlayer_session=attacker-chosen-value';

    const signIn = await request(ctx.app).post('/api/auth/sign-in').set('Cookie', fixed).send({ email: user.email, password: user.password });
    expect(signIn.status).toBe(200);
    const fresh = (signIn.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('quietlayer_session='))!.split(';')[0];
    expect(fresh).not.toBe(fixed);

    expect((await request(ctx.app).get('/api/me').set('Cookie', fixed)).status).toBe(401);
    expect((await request(ctx.app).get('/api/me').set('Cookie', fresh)).status).toBe(200);
  });
});
