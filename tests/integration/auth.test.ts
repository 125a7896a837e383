import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { sealData } from 'iron-session';
import { eq } from 'drizzle-orm';
import { endedSessions, users } from '../../server/db/schema';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, sessionCookieFrom, signedInAgent, uniqueEmail } from './helpers/users';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

describe('sign-in', () => {
  it('signs in with the right password, sets a hardened session cookie and answers /api/me', async () => {
    const user = await createTestUser(ctx.db, { role: 'technician' });
    const agent = request.agent(ctx.app);

    const response = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });

    expect(response.status).toBe(200);
    expect(response.body).toEqual({ user: { id: user.id, email: user.email, displayName: user.displayName, role: 'technician' } });
    const cookie = sessionCookieFrom(response.headers);
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/;\s*Secure/i);
    // iron-session sets Max-Age to the ttl minus 60 s of clock-skew allowance: 8 h − 60 s.
    expect(cookie).toMatch(/Max-Age=28740/);

    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(user.email);
  });

  it('accepts the e-mail in any letter case', async () => {
    const user = await createTestUser(ctx.db);
    const response = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email.toUpperCase(), password: user.password });
    expect(response.status).toBe(200);
  });

  it('answers the same 401 for an unknown e-mail, a wrong password and an inactive account', async () => {
    const user = await createTestUser(ctx.db);
    const inactive = await createTestUser(ctx.db, { active: false });

    const unknown = await request(ctx.app).post('/api/auth/sign-in').send({ email: uniqueEmail('nobody'), password: 'whatever-password' });
    const wrong = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: 'not-the-password' });
    const disabled = await request(ctx.app).post('/api/auth/sign-in').send({ email: inactive.email, password: inactive.password });

    for (const response of [unknown, wrong, disabled]) {
      expect(response.status).toBe(401);
      expect(response.body.error.code).toBe('invalid_credentials');
      expect(sessionCookieFrom(response.headers)).toBeUndefined();
    }
    expect(wrong.body).toEqual(unknown.body);
    expect(disabled.body).toEqual(unknown.body);
  });

  it('issues a fresh session cookie on every sign-in, even over an existing session', async () => {
    const user = await createTestUser(ctx.db);
    const agent = await signedInAgent(ctx.app, user);
    const first = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    const second = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    const a = sessionCookieFrom(first.headers);
    const b = sessionCookieFrom(second.headers);
    expect(a).toBeDefined();
    expect(b).toBeDefined();
    expect(a).not.toBe(b);
  });

  it('signs out: 204, the cookie is cleared and /api/me answers 401; signing out twice is fine', async () => {
    const user = await createTestUser(ctx.db);
    const agent = await signedInAgent(ctx.app, user);
    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    expect(sessionCookieFrom(out.headers)).toMatch(/Max-Age=0/);
    expect((await agent.get('/api/me')).status).toBe(401);
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
  });

  it('sign-out ends that session on the server: a copy of its cookie gets 401, another session of the user stays signed in', async () => {
    const user = await createTestUser(ctx.db);
    const first = request.agent(ctx.app);
    const signIn = await first.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    const copied = sessionCookieFrom(signIn.headers)!.split(';')[0];
    const second = await signedInAgent(ctx.app, user);
    expect((await request(ctx.app).get('/api/me').set('Cookie', copied)).status).toBe(200);

    expect((await first.post('/api/auth/sign-out')).status).toBe(204);

    const replay = await request(ctx.app).get('/api/me').set('Cookie', copied);
    expect(replay.status).toBe(401);
    expect(replay.body.error.code).toBe('unauthenticated');
    expect((await second.get('/api/me')).status).toBe(200);
    const rows = await ctx.db.select().from(endedSessions).where(eq(endedSessions.userId, user.id));
    expect(rows).toHaveLength(1);
    // Ends when the cookie would have expired anyway: issuedAt + 8 h.
    const hoursLeft = (rows[0].expiresAt.getTime() - Date.now()) / 3600_000;
    expect(hoursLeft).toBeGreaterThan(7.9);
    expect(hoursLeft).toBeLessThanOrEqual(8);
  });

  it("records 'user.signed_out' for the signed-in user once; an anonymous or repeated sign-out records nothing", async () => {
    const user = await createTestUser(ctx.db);
    const agent = request.agent(ctx.app);
    const signIn = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    const copied = sessionCookieFrom(signIn.headers)!.split(';')[0];
    const signedOut = async () =>
      (
        await ctx.pool.query<{ actor_id: string; actor_email: string; entity_type: string; entity_id: string; request_id: string | null }>(
          `select actor_id, actor_email, entity_type, entity_id, request_id from audit_events
            where action = 'user.signed_out' and entity_id = $1`,
          [user.id],
        )
      ).rows;
    expect(await signedOut()).toEqual([]);

    const out = await agent.post('/api/auth/sign-out').set('X-Request-Id', 'sign-out-audit-1');
    expect(out.status).toBe(204);
    expect(await signedOut()).toEqual([
      { actor_id: user.id, actor_email: user.email, entity_type: 'user', entity_id: user.id, request_id: 'sign-out-audit-1' },
    ]);

    expect((await agent.post('/api/auth/sign-out')).status).toBe(204); // cookie already cleared
    expect((await request(ctx.app).post('/api/auth/sign-out').set('Cookie', copied)).status).toBe(204); // session already ended
    expect((await request(ctx.app).post('/api/auth/sign-out')).status).toBe(204); // never signed in
    expect(await signedOut()).toHaveLength(1);
  });

  it('sign-out deletes ended-session rows whose cookies have expired', async () => {
    const user = await createTestUser(ctx.db);
    const stale = crypto.randomUUID();
    await ctx.db.insert(endedSessions).values({ sessionId: stale, userId: user.id, expiresAt: new Date(Date.now() - 60_000) });
    const agent = await signedInAgent(ctx.app, user);
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    const left = await ctx.db.select({ sessionId: endedSessions.sessionId }).from(endedSessions).where(eq(endedSessions.userId, user.id));
    expect(left.map((row) => row.sessionId)).not.toContain(stale);
    expect(left).toHaveLength(1);
  });

  it('ends the session of a user who is deactivated meanwhile', async () => {
    const user = await createTestUser(ctx.db);
    const agent = await signedInAgent(ctx.app, user);
    await ctx.db.update(users).set({ active: false }).where(eq(users.id, user.id));
    const me = await agent.get('/api/me');
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('unauthenticated');
  });
});

describe('session expiry (8 h, checked on the server)', () => {
  async function cookieFor(data: Record<string, unknown>): Promise<string> {
    const seal = await sealData(data, { password: ctx.env.SESSION_SECRET, ttl: ctx.env.SESSION_TTL_SECONDS });
    return `quietlayer_session=${seal}`;
  }

  it('accepts a validly sealed session issued a minute ago', async () => {
    const user = await createTestUser(ctx.db);
    const response = await request(ctx.app)
      .get('/api/me')
      .set('Cookie', await cookieFor({ userId: user.id, issuedAt: Date.now() - 60_000 }));
    expect(response.status).toBe(200);
  });

  it('keeps accepting a cookie sealed before sessions had ids until it expires; signing out with it records nothing', async () => {
    const user = await createTestUser(ctx.db);
    const legacy = await cookieFor({ userId: user.id, issuedAt: Date.now() - 60_000 });
    expect((await request(ctx.app).get('/api/me').set('Cookie', legacy)).status).toBe(200);
    expect((await request(ctx.app).post('/api/auth/sign-out').set('Cookie', legacy)).status).toBe(204);
    expect(await ctx.db.select().from(endedSessions).where(eq(endedSessions.userId, user.id))).toEqual([]);
  });

  it('refuses a sealed session whose id was ended, even for a well-formed cookie', async () => {
    const user = await createTestUser(ctx.db);
    const sessionId = crypto.randomUUID();
    const cookie = await cookieFor({ userId: user.id, issuedAt: Date.now() - 60_000, sessionId });
    expect((await request(ctx.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
    await ctx.db.insert(endedSessions).values({ sessionId, userId: user.id, expiresAt: new Date(Date.now() + 3600_000) });
    expect((await request(ctx.app).get('/api/me').set('Cookie', cookie)).status).toBe(401);
  });

  it('refuses a validly sealed session whose issuedAt is more than 8 hours old', async () => {
    const user = await createTestUser(ctx.db);
    const nineHoursAgo = Date.now() - 9 * 3600 * 1000;
    const response = await request(ctx.app).get('/api/me').set('Cookie', await cookieFor({ userId: user.id, issuedAt: nineHoursAgo }));
    expect(response.status).toBe(401);
    expect(response.body.error.code).toBe('unauthenticated');
  });

  it('refuses a session without issuedAt, and a cookie sealed with another secret', async () => {
    const user = await createTestUser(ctx.db);
    const noIssuedAt = await request(ctx.app).get('/api/me').set('Cookie', await cookieFor({ userId: user.id }));
    expect(noIssuedAt.status).toBe(401);
    const foreign = await sealData({ userId: user.id, issuedAt: Date.now() }, { password: 'x'.repeat(40), ttl: 3600 });
    const forged = await request(ctx.app).get('/api/me').set('Cookie', `quietlayer_session=${foreign}`);
    expect(forged.status).toBe(401);
  });

  it('honours a shorter SESSION_TTL_SECONDS', async () => {
    const shortLived = createTestContext({ env: { SESSION_TTL_SECONDS: '60' } });
    try {
      const user = await createTestUser(ctx.db);
      const seal = await sealData({ userId: user.id, issuedAt: Date.now() - 120_000 }, { password: ctx.env.SESSION_SECRET, ttl: 3600 });
      const response = await request(shortLived.app).get('/api/me').set('Cookie', `quietlayer_session=${seal}`);
      expect(response.status).toBe(401);
    } finally {
      await shortLived.close();
    }
  });
});

describe('throttling', () => {
  it('locks an account after 5 wrong passwords: 429 with Retry-After even for the right password', async () => {
    const user = await createTestUser(ctx.db);
    for (let attempt = 1; attempt <= 5; attempt += 1) {
      const response = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: `wrong-${attempt}` });
      expect(response.status).toBe(401);
    }
    const locked = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    expect(locked.status).toBe(429);
    expect(locked.body.error.code).toBe('too_many_requests');
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(locked.headers['retry-after'])).toBeLessThanOrEqual(60);
    expect(locked.body.error.message).not.toMatch(/lock|account/i);
  });

  it('doubles the lock for each further failure once the lock has passed, and a success resets the count', async () => {
    const user = await createTestUser(ctx.db);
    // Five failures already counted, the 1-minute lock already over.
    await ctx.db.update(users).set({ failedSignIns: 5, lockedUntil: new Date(Date.now() - 1000) }).where(eq(users.id, user.id));
    const sixth = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: 'wrong-again' });
    expect(sixth.status).toBe(401);
    const [row] = await ctx.db.select().from(users).where(eq(users.id, user.id));
    const lockSeconds = (row.lockedUntil!.getTime() - Date.now()) / 1000;
    expect(lockSeconds).toBeGreaterThan(100); // 2 min for the 6th failure
    expect(lockSeconds).toBeLessThanOrEqual(120);

    await ctx.db.update(users).set({ lockedUntil: new Date(Date.now() - 1000) }).where(eq(users.id, user.id));
    expect((await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password })).status).toBe(200);
    const [after] = await ctx.db.select().from(users).where(eq(users.id, user.id));
    expect(after.failedSignIns).toBe(0);
    expect(after.lockedUntil).toBeNull();
  });

  it('limits sign-in attempts per client address (express-rate-limit): 429 after the limit', async () => {
    const tight = createTestContext({ rateLimits: { signIn: { windowMs: 60_000, limit: 3 } } });
    try {
      const statuses: number[] = [];
      for (let attempt = 0; attempt < 4; attempt += 1) {
        const response = await request(tight.app).post('/api/auth/sign-in').send({ email: uniqueEmail('flood'), password: 'whatever-it-is' });
        statuses.push(response.status);
        if (response.status === 429) {
          expect(response.body.error.code).toBe('too_many_requests');
          expect(Number(response.headers['retry-after'])).toBeGreaterThan(0);
        }
      }
      expect(statuses).toEqual([401, 401, 401, 429]);
    } finally {
      await tight.close();
    }
  });
});
