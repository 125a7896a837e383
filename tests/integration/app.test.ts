import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestContext, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

describe('health, public config and unknown routes', () => {
  it('GET /api/health reports the database up', async () => {
    const response = await request(ctx.app).get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ status: 'ok', database: 'up' });
  });

  it('echoes a well-formed X-Request-Id and makes one up otherwise', async () => {
    const echoed = await request(ctx.app).get('/api/health').set('X-Request-Id', 'probe-123');
    expect(echoed.headers['x-request-id']).toBe('probe-123');
    const made = await request(ctx.app).get('/api/health').set('X-Request-Id', 'bad id with spaces <script>');
    expect(made.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('sets helmet security headers', async () => {
    const response = await request(ctx.app).get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    expect(response.headers['x-powered-by']).toBeUndefined();
  });

  it('lists the four demo sign-ins in demo mode', async () => {
    const response = await request(ctx.app).get('/api/config/public');
    expect(response.status).toBe(200);
    expect(response.body.demoMode).toBe(true);
    expect(response.body.demoSignIns.map((d: { email: string; role: string }) => `${d.role}:${d.email}`)).toEqual([
      'administrator:admin@larkspur.example',
      'engineer:engineer@larkspur.example',
      'technician:technician@larkspur.example',
      'reviewer:reviewer@larkspur.example',
    ]);
  });

  it('the demo sign-ins really sign in (seeded by the test setup)', async () => {
    const { body } = await request(ctx.app).get('/api/config/public');
    for (const demo of body.demoSignIns as { email: string; password: string; role: string }[]) {
      const response = await request(ctx.app).post('/api/auth/sign-in').send({ email: demo.email, password: demo.password });
      expect(response.status, demo.email).toBe(200);
      expect(response.body.user.role).toBe(demo.role);
    }
  });

  it('never lists demo sign-ins in production mode', async () => {
    const production = createTestContext({ env: { QUIETLAYER_MODE: 'production', BCRYPT_COST: '12', SESSION_SECRET: 'p'.repeat(48) } });
    try {
      const response = await request(production.app).get('/api/config/public');
      expect(response.body).toEqual({ demoMode: false, demoSignIns: [] });
    } finally {
      await production.close();
    }
  });

  it('answers unknown /api routes with a JSON 404', async () => {
    const response = await request(ctx.app).get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.body.error.code).toBe('not_found');
  });
});

describe('serving the built client', () => {
  let dir: string;
  let withClient: TestContext;
  beforeAll(() => {
    dir = mkdtempSync(path.join(tmpdir(), 'quietlayer-client-'));
    writeFileSync(path.join(dir, 'index.html'), '<!doctype html><title>QuietLayer</title><div id="root"></div>');
    writeFileSync(path.join(dir, 'app.js'), 'console.log("client")');
    withClient = createTestContext({ clientDir: dir });
  });
  afterAll(async () => {
    await withClient.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('serves static files, index.html for client routes, and still JSON 404 for /api', async () => {
    expect((await request(withClient.app).get('/app.js')).text).toContain('client');
    const page = await request(withClient.app).get('/admin/users');
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toMatch(/text\/html/);
    expect(page.text).toContain('<div id="root">');
    expect((await request(withClient.app).get('/')).text).toContain('QuietLayer');
    const api = await request(withClient.app).get('/api/nothing/here');
    expect(api.status).toBe(404);
    expect(api.body.error.code).toBe('not_found');
  });
});

describe('when the database is down', () => {
  let down: TestContext;
  beforeAll(() => {
    // Port 9 (discard) on loopback: nothing listens, so pg fails to connect at once.
    down = createTestContext({ databaseUrl: 'postgres://postgres@127.0.0.1:9/quietlayer' });
  });
  afterAll(async () => {
    await down.close();
  });

  it('health answers 503 degraded/down', async () => {
    const response = await request(down.app).get('/api/health');
    expect(response.status).toBe(503);
    expect(response.body).toEqual({ status: 'degraded', database: 'down' });
  });

  it('other routes answer 503 unavailable in the error shape, without internals', async () => {
    const response = await request(down.app).post('/api/auth/sign-in').send({ email: 'someone@larkspur.example', password: 'whatever' });
    expect(response.status).toBe(503);
    expect(response.body.error.code).toBe('unavailable');
    expect(JSON.stringify(response.body)).not.toMatch(/ECONNREFUSED|127\.0\.0\.1|stack/);
  });
});

describe('health with a session cookie while the database is down', () => {
  it('still answers with the health body', async () => {
    const { sealData } = await import('iron-session');
    const down = createTestContext({ databaseUrl: 'postgres://postgres@127.0.0.1:9/quietlayer' });
    try {
      const seal = await sealData(
        { userId: '5b0c1f7e-2a9d-4c3e-9f7a-000000000001', issuedAt: Date.now() },
        { password: down.env.SESSION_SECRET, ttl: 3600 },
      );
      const response = await request(down.app).get('/api/health').set('Cookie', `quietlayer_session=${seal}`);
      expect(response.status).toBe(503);
      expect(response.body).toEqual({ status: 'degraded', database: 'down' });
    } finally {
      await down.close();
    }
  });
});
