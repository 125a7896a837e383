/**
 * Fault: PostgreSQL stops under a running server and comes back. Requests that need the database are
 * answered 503 'unavailable' quickly (the pool's 2 s connection timeout, not a hang), the health probe
 * says 'down', and once PostgreSQL is back the same app instance serves again, no restart.
 * Uses a throwaway PostgreSQL cluster of its own; the shared development server is never stopped.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { createDatabaseIfMissing, databaseUrlFor, migrateDatabase } from '../../scripts/lib/database';
import { createTestContext, type TestContext } from '../integration/helpers/test-app';
import { createTestUser, signedInAgent, uniqueEmail } from '../integration/helpers/users';
import { DATABASE_WAIT_MS } from '../../server/middleware/db-unavailable';
import { clusterPids, startThrowawayPostgres, type ThrowawayPostgres } from './support/throwaway-postgres';

/** Far above the 2 s connection timeout, far below "hanging". */
const FAIL_FAST_MS = 5_000;

let postgres: ThrowawayPostgres;
let ctx: TestContext;
let admin: TestAgent;

beforeAll(async () => {
  postgres = await startThrowawayPostgres();
  await createDatabaseIfMissing(postgres.adminUrl, 'quietlayer_fault');
  const url = databaseUrlFor(postgres.adminUrl, 'quietlayer_fault');
  await migrateDatabase(url);
  ctx = createTestContext({ databaseUrl: url });
  admin = await signedInAgent(ctx.app, await createTestUser(ctx.db, { role: 'administrator' }));
}, 120_000);

let frozen: number[] = [];
afterAll(async () => {
  for (const pid of frozen) signal(pid, 'SIGCONT');
  await ctx?.close().catch(() => {});
  postgres?.destroy();
});

function signal(pid: number, name: NodeJS.Signals): void {
  try {
    process.kill(pid, name);
  } catch {
    // already gone
  }
}

async function timed<T>(work: () => Promise<T>): Promise<{ value: T; ms: number }> {
  const started = performance.now();
  const value = await work();
  return { value, ms: performance.now() - started };
}

describe('PostgreSQL stopped and restarted under a running server', () => {
  it('answers 503 fast while the database is down and recovers without restarting the app', async () => {
    expect((await admin.get('/api/users')).status).toBe(200);

    postgres.stop();

    const health = await timed(() => request(ctx.app).get('/api/health'));
    expect(health.value.status).toBe(503);
    expect(health.value.body).toEqual({ status: 'degraded', database: 'down' });
    expect(health.ms).toBeLessThan(FAIL_FAST_MS);

    const read = await timed(() => admin.get('/api/users'));
    expect(read.value.status).toBe(503);
    expect(read.value.body.error.code).toBe('unavailable');
    expect(read.ms).toBeLessThan(FAIL_FAST_MS);

    const write = await timed(() => admin.post('/api/users/invitations').send({ email: uniqueEmail('outage'), displayName: 'During outage', role: 'technician' }));
    expect(write.value.status).toBe(503);
    expect(write.ms).toBeLessThan(FAIL_FAST_MS);

    // Many at once while down: every one answered, none hangs.
    const burst = await timed(() => Promise.all(Array.from({ length: 20 }, () => admin.get('/api/users'))));
    expect(burst.value.map((r) => r.status)).toEqual(Array(20).fill(503));
    expect(burst.ms).toBeLessThan(2 * FAIL_FAST_MS);

    postgres.start();

    // The same app instance (same pool) serves again once connections succeed.
    let recovered = 0;
    const deadline = Date.now() + 20_000;
    while (Date.now() < deadline) {
      if ((await admin.get('/api/users')).status === 200) {
        recovered = Date.now();
        break;
      }
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    expect(recovered).toBeGreaterThan(0);
    expect((await request(ctx.app).get('/api/health')).body).toEqual({ status: 'ok', database: 'up' });
    const invited = await admin.post('/api/users/invitations').send({ email: uniqueEmail('after'), displayName: 'After outage', role: 'technician' });
    expect(invited.status).toBe(201);
  }, 120_000);
});

describe('PostgreSQL frozen (answers nothing, refuses nothing) under a running server', () => {
  it('answers 503 once the wait limit passes and a fresh probe gets no answer; recovers when it thaws', async () => {
    const user = await createTestUser(ctx.db, { role: 'administrator' });
    const agent = await signedInAgent(ctx.app, user);
    // Warm the pool so requests go out on connections opened before the freeze (those would wait for ever).
    await Promise.all(Array.from({ length: 4 }, () => agent.get('/api/users')));

    frozen = clusterPids(postgres.port);
    expect(frozen.length).toBeGreaterThan(1);
    for (const pid of frozen) signal(pid, 'SIGSTOP');

    const stuck = await timed(() => agent.get('/api/users').timeout(60_000));
    expect(stuck.value.status).toBe(503);
    expect(stuck.value.body.error.code).toBe('unavailable');
    // The wait limit, then one probe (3 s connect limit); generous room for a busy machine.
    expect(stuck.ms).toBeGreaterThanOrEqual(DATABASE_WAIT_MS - 50);
    expect(stuck.ms).toBeLessThan(DATABASE_WAIT_MS + 10_000);

    for (const pid of frozen) signal(pid, 'SIGCONT');
    frozen = [];
    let status = 0;
    const deadline = Date.now() + 30_000;
    while (Date.now() < deadline && status !== 200) {
      status = (await agent.get('/api/users').timeout(30_000)).status;
      if (status !== 200) await new Promise((resolve) => setTimeout(resolve, 200));
    }
    expect(status).toBe(200);
  }, 120_000);
});
