import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, desc, eq, notInArray } from 'drizzle-orm';
import { auditEvents, users } from '../../server/db/schema';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

describe('users admin', () => {
  it('lists users filtered by a piece of the e-mail or name, with paging', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const tag = `zz${Date.now().toString(36)}`;
    const a = await createTestUser(ctx.db, { label: `${tag}-a` });
    const b = await createTestUser(ctx.db, { label: `${tag}-b` });
    const agent = await signedInAgent(ctx.app, admin);

    const all = await agent.get('/api/users').query({ q: tag });
    expect(all.status).toBe(200);
    expect(all.body.total).toBe(2);
    expect(all.body.items.map((u: { email: string }) => u.email)).toEqual([a.email, b.email]);
    expect(all.body.items[0]).not.toHaveProperty('passwordHash');

    const page2 = await agent.get('/api/users').query({ q: tag, page: 2, pageSize: 1 });
    expect(page2.body).toMatchObject({ total: 2, page: 2, pageSize: 1 });
    expect(page2.body.items.map((u: { email: string }) => u.email)).toEqual([b.email]);

    // LIKE wildcards are taken literally.
    expect((await agent.get('/api/users').query({ q: '%' })).body.total).toBe(0);
    expect((await agent.get('/api/users').query({ pageSize: 201 })).status).toBe(400);
  });

  it('changes a role and records before/after, the actor and the request id in the audit trail', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const target = await createTestUser(ctx.db, { role: 'technician' });
    const agent = await signedInAgent(ctx.app, admin);

    const response = await agent.patch(`/api/users/${target.id}`).set('X-Request-Id', 'role-change-7').send({ role: 'engineer' });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ id: target.id, role: 'engineer', active: true });
    expect(response.headers['x-request-id']).toBe('role-change-7');

    const [event] = await ctx.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityId, target.id), eq(auditEvents.action, 'user.updated')))
      .orderBy(desc(auditEvents.id));
    expect(event).toMatchObject({
      actorId: admin.id,
      actorEmail: admin.email,
      entityType: 'user',
      requestId: 'role-change-7',
      before: { role: 'technician', active: true },
      after: { role: 'engineer', active: true },
    });

    const audit = await agent.get('/api/audit').query({ actor: admin.email, entityType: 'user' });
    expect(audit.status).toBe(200);
    expect(audit.body.items.some((e: { action: string; entityId: string }) => e.action === 'user.updated' && e.entityId === target.id)).toBe(true);
  });

  it('deactivates another user, whose session then ends', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const target = await createTestUser(ctx.db);
    const targetAgent = await signedInAgent(ctx.app, target);
    const agent = await signedInAgent(ctx.app, admin);
    const response = await agent.patch(`/api/users/${target.id}`).send({ active: false });
    expect(response.status).toBe(200);
    expect(response.body.active).toBe(false);
    expect((await targetAgent.get('/api/me')).status).toBe(401);
  });

  it('refuses (422) to let administrators deactivate themselves, and changes nothing', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const agent = await signedInAgent(ctx.app, admin);
    const response = await agent.patch(`/api/users/${admin.id}`).send({ active: false });
    expect(response.status).toBe(422);
    expect(response.body.error.code).toBe('unprocessable');
    expect(response.body.error.fields.active).toMatch(/your own account/);
    const [row] = await ctx.db.select().from(users).where(eq(users.id, admin.id));
    expect(row.active).toBe(true);
  });

  it('answers 404 for an unknown user id and 400 for a malformed one', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const agent = await signedInAgent(ctx.app, admin);
    expect((await agent.patch('/api/users/5b0c1f7e-2a9d-4c3e-9f7a-000000000000').send({ role: 'engineer' })).status).toBe(404);
    const malformed = await agent.patch('/api/users/not-a-uuid').send({ role: 'engineer' });
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields.id).toBeDefined();
  });
});

describe('the last active administrator (own database, one administrator in it)', () => {
  let scratch: ScratchDatabase;
  let local: TestContext;
  beforeAll(async () => {
    scratch = await createScratchDatabase();
    local = createTestContext({ databaseUrl: scratch.url });
  });
  afterAll(async () => {
    await local.close();
    await scratch.drop();
  });

  it('cannot be demoted or deactivated; once a second administrator exists, demotion works', async () => {
    const only = await createTestUser(local.db, { role: 'administrator' });
    const agent = await signedInAgent(local.app, only);

    const demote = await agent.patch(`/api/users/${only.id}`).send({ role: 'engineer' });
    expect(demote.status).toBe(422);
    expect(demote.body.error.fields.role).toMatch(/at least one active administrator/);

    // A second, inactive administrator does not count.
    const dormant = await createTestUser(local.db, { role: 'administrator', active: false });
    expect((await agent.patch(`/api/users/${only.id}`).send({ role: 'reviewer' })).status).toBe(422);

    // Re-activating them makes two: now the first may step down; then the second is the last one.
    expect((await agent.patch(`/api/users/${dormant.id}`).send({ active: true })).status).toBe(200);
    const stepDown = await agent.patch(`/api/users/${only.id}`).send({ role: 'engineer' });
    expect(stepDown.status).toBe(200);
    expect(stepDown.body.role).toBe('engineer');

    const second = await signedInAgent(local.app, dormant);
    const deactivateLast = await second.patch(`/api/users/${dormant.id}`).send({ role: 'technician' });
    expect(deactivateLast.status).toBe(422);
    const [row] = await local.db.select().from(users).where(eq(users.id, dormant.id));
    expect(row).toMatchObject({ role: 'administrator', active: true });
  });

  it('lets only one of two administrators demoting each other at the same moment succeed', async () => {
    const first = await createTestUser(local.db, { role: 'administrator' });
    const second = await createTestUser(local.db, { role: 'administrator' });
    // Leave exactly these two active administrators.
    await local.db
      .update(users)
      .set({ active: false })
      .where(and(eq(users.role, 'administrator'), notInArray(users.id, [first.id, second.id])));
    const [a, b] = await Promise.all([signedInAgent(local.app, first), signedInAgent(local.app, second)]);

    const results = await Promise.all([
      a.patch(`/api/users/${second.id}`).send({ role: 'engineer' }),
      b.patch(`/api/users/${first.id}`).send({ role: 'engineer' }),
    ]);

    // The loser is refused either by the rule (422) or, if the winner committed before its
    // role check ran, because it is no longer an administrator (403). Never both succeed.
    const statuses = results.map((r) => r.status).sort();
    expect(statuses[0]).toBe(200);
    expect([403, 422]).toContain(statuses[1]);
    const rows = await local.db.select().from(users).where(and(eq(users.role, 'administrator'), eq(users.active, true)));
    expect(rows).toHaveLength(1);
  });
});
