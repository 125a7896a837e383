import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sql } from 'drizzle-orm';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

describe('audit trail', () => {
  it('is append-only: the database rejects UPDATE and DELETE of an event', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    await signedInAgent(ctx.app, admin); // writes a user.signed_in event
    const { rows } = await ctx.pool.query<{ id: string }>(`select id from audit_events where actor_id = $1 limit 1`, [admin.id]);
    expect(rows).toHaveLength(1);
    const id = rows[0].id;

    await expect(ctx.pool.query(`update audit_events set action = 'tampered' where id = $1`, [id])).rejects.toThrow(/append-only/);
    await expect(ctx.pool.query(`delete from audit_events where id = $1`, [id])).rejects.toThrow(/append-only/);
    const { rows: after } = await ctx.pool.query(`select action from audit_events where id = $1`, [id]);
    expect(after).toEqual([{ action: 'user.signed_in' }]);
  });

  it('filters by actor e-mail, entity type and dates, newest first', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const target = await createTestUser(ctx.db, { role: 'technician' });
    const agent = await signedInAgent(ctx.app, admin);
    await agent.patch(`/api/users/${target.id}`).send({ role: 'reviewer' });
    await agent.patch(`/api/users/${target.id}`).send({ role: 'engineer' });

    const today = new Date().toISOString().slice(0, 10);
    const response = await agent.get('/api/audit').query({ actor: admin.email.toUpperCase(), entityType: 'user', from: today, to: today });
    expect(response.status).toBe(200);
    const actions = response.body.items.map((e: { action: string }) => e.action);
    expect(actions).toEqual(['user.updated', 'user.updated', 'user.signed_in']);
    expect(response.body.items[0].after).toEqual({ role: 'engineer', active: true });
    expect(response.body.total).toBe(3);

    const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
    const none = await agent.get('/api/audit').query({ actor: admin.email, to: yesterday });
    expect(none.body.total).toBe(0);

    const badDate = await agent.get('/api/audit').query({ from: '2024-13-45' });
    expect(badDate.status).toBe(400);
    expect(badDate.body.error.fields.from).toMatch(/YYYY-MM-DD/);
  });
});
