import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { count, eq, sql } from 'drizzle-orm';
import { auditEvents, invitations, outboxMessages, users } from '../../server/db/schema';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent, uniqueEmail, type TestUser } from './helpers/users';

let ctx: TestContext;
let admin: TestUser;
let agent: Awaited<ReturnType<typeof signedInAgent>>;
beforeAll(async () => {
  ctx = createTestContext();
  admin = await createTestUser(ctx.db, { role: 'administrator' });
  agent = await signedInAgent(ctx.app, admin);
});
afterAll(async () => {
  await ctx.close();
});

/** Rows this test could have written: invitations and mail for `email`, audit events by the admin. */
async function writtenFor(email: string) {
  const lowered = email.toLowerCase();
  const [[inv], [mail], [audit], [acct]] = await Promise.all([
    ctx.db.select({ n: count() }).from(invitations).where(sql`lower(${invitations.email}) = ${lowered}`),
    ctx.db.select({ n: count() }).from(outboxMessages).where(sql`lower(${outboxMessages.toAddress}) = ${lowered}`),
    ctx.db.select({ n: count() }).from(auditEvents).where(eq(auditEvents.actorId, admin.id)),
    ctx.db.select({ n: count() }).from(users).where(sql`lower(${users.email}) = ${lowered}`),
  ]);
  return { invitations: inv.n, outbox: mail.n, audit: audit.n, users: acct.n };
}

describe('bad input on invite: 400 naming the field, nothing written', () => {
  const cases: { name: string; body: (email: string) => unknown; field: string; message?: RegExp }[] = [
    { name: 'missing e-mail', body: () => ({ displayName: 'No Mail', role: 'engineer' }), field: 'email', message: /email is required/ },
    { name: 'missing role', body: (email) => ({ email, displayName: 'No Role' }), field: 'role' },
    { name: 'extra field', body: (email) => ({ email, displayName: 'Extra', role: 'engineer', isAdmin: true }), field: 'isAdmin', message: /not an accepted field/ },
    { name: 'wrong type', body: (email) => ({ email, displayName: 42, role: 'engineer' }), field: 'displayName' },
    { name: 'unknown role', body: (email) => ({ email, displayName: 'Bad Role', role: 'superuser' }), field: 'role' },
    {
      name: 'e-mail longer than 254 characters',
      body: () => ({ email: `${'a'.repeat(250)}@larkspur.example`, displayName: 'Long', role: 'engineer' }),
      field: 'email',
      message: /at most 254/,
    },
    { name: 'not an e-mail', body: () => ({ email: 'not-an-address', displayName: 'Nope', role: 'engineer' }), field: 'email', message: /valid e-mail/ },
    { name: 'empty display name', body: (email) => ({ email, displayName: '   ', role: 'engineer' }), field: 'displayName' },
  ];

  for (const testCase of cases) {
    it(`${testCase.name} → 400 with fields.${testCase.field}`, async () => {
      const email = uniqueEmail('bad');
      const before = await writtenFor(email);
      const response = await agent.post('/api/users/invitations').send(testCase.body(email) as object);
      expect(response.status).toBe(400);
      expect(response.body.error.code).toBe('invalid_input');
      expect(Object.keys(response.body.error.fields)).toContain(testCase.field);
      if (testCase.message) expect(response.body.error.fields[testCase.field]).toMatch(testCase.message);
      expect(await writtenFor(email)).toEqual(before);
    });
  }

  it('malformed JSON → 400 malformed_json, nothing written', async () => {
    const before = await writtenFor('nobody@larkspur.example');
    const response = await agent.post('/api/users/invitations').set('Content-Type', 'application/json').send('{"email": "x@y.example",');
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('malformed_json');
    expect(await writtenFor('nobody@larkspur.example')).toEqual(before);
  });

  it('a body over 1 MB → 413 in the error shape', async () => {
    const response = await agent
      .post('/api/users/invitations')
      .send({ email: uniqueEmail('big'), displayName: 'x'.repeat(1_100_000), role: 'engineer' });
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('payload_too_large');
  });
});

describe('bad input on sign-in and user changes', () => {
  it('sign-in: missing password, extra field, wrong type and over-long e-mail each name the field', async () => {
    const missing = await request(ctx.app).post('/api/auth/sign-in').send({ email: admin.email });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields.password).toMatch(/password is required/);

    const extra = await request(ctx.app).post('/api/auth/sign-in').send({ email: admin.email, password: 'x', remember: true });
    expect(extra.status).toBe(400);
    expect(extra.body.error.fields.remember).toBeDefined();

    const wrongType = await request(ctx.app).post('/api/auth/sign-in').send({ email: ['a@b.example'], password: 'x' });
    expect(wrongType.status).toBe(400);
    expect(wrongType.body.error.fields.email).toBeDefined();

    const long = await request(ctx.app).post('/api/auth/sign-in').send({ email: `${'b'.repeat(260)}@larkspur.example`, password: 'x' });
    expect(long.status).toBe(400);
    expect(long.body.error.fields.email).toMatch(/254/);

    // None of these counted as a failed sign-in against the account.
    const [row] = await ctx.db.select().from(users).where(eq(users.id, admin.id));
    expect(row.failedSignIns).toBe(0);
  });

  it('PATCH with no change, a wrong type or an extra field → 400 and the user is unchanged', async () => {
    const target = await createTestUser(ctx.db, { role: 'technician' });
    const auditBefore = await writtenFor(target.email);

    const empty = await agent.patch(`/api/users/${target.id}`).send({});
    expect(empty.status).toBe(400);
    expect(empty.body.error.fields._).toMatch(/role or active/);

    const wrongType = await agent.patch(`/api/users/${target.id}`).send({ active: 'no' });
    expect(wrongType.status).toBe(400);
    expect(wrongType.body.error.fields.active).toBeDefined();

    const extra = await agent.patch(`/api/users/${target.id}`).send({ role: 'engineer', email: 'new@larkspur.example' });
    expect(extra.status).toBe(400);
    expect(extra.body.error.fields.email).toMatch(/not an accepted field/);

    const [row] = await ctx.db.select().from(users).where(eq(users.id, target.id));
    expect(row).toMatchObject({ role: 'technician', active: true });
    expect(await writtenFor(target.email)).toEqual(auditBefore);
  });

  it('list queries: pageSize over 200 and page 0 name the field', async () => {
    const tooBig = await agent.get('/api/outbox').query({ pageSize: 500 });
    expect(tooBig.status).toBe(400);
    expect(tooBig.body.error.fields.pageSize).toMatch(/at most 200/);
    const zero = await agent.get('/api/audit').query({ page: 0 });
    expect(zero.status).toBe(400);
    expect(zero.body.error.fields.page).toMatch(/at least 1/);
  });
});

describe('a body that is not JSON', () => {
  it('answers 400 asking for a JSON object and creates nothing', async () => {
    const email = uniqueEmail('plain');
    const response = await agent.post('/api/users/invitations').set('Content-Type', 'text/plain').send(`email=${email}`);
    expect(response.status).toBe(400);
    expect(response.body.error.fields._).toMatch(/JSON object/);
    expect((await writtenFor(email)).invitations).toBe(0);
  });
});
