import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { asc, eq } from 'drizzle-orm';
import { createDatabase } from '../../server/db/client';
import { propertySpreadChunks } from '../../server/db/schema/beyond-onset';
import { startServer, type StartedServer } from '../../server/index';
import { createLayerSpreadEvaluator } from '../../shared/physics/spread/create-layer-spread-evaluator';
import { runSpreadChunk } from '../../shared/physics/spread/run-spread-chunk';
import { summarizeSpread } from '../../shared/physics/spread/summarize-spread';
import type { SpreadPlan } from '../../shared/physics/spread/spread-types';
import type { PhysicalLayer } from '../../shared/physics/sizing/types';
import { propertySpreads } from '../../server/db/schema/beyond-onset';
import { createTestUser } from './helpers/users';
import { roundFluid } from './helpers/round-fluid';

/**
 * A queued Property spread survives a server restart: server A's worker stores some chunks, A stops
 * (its job is failed and retried by pg-boss), server B starts and finishes from the stored chunks.
 * JOBS_CHUNK_PAUSE_MS slows the worker so that "mid-run" is a wide window.
 */
const { db, pool } = createDatabase(process.env.DATABASE_URL as string, { max: 2 });
let servers: StartedServer[] = [];
const saved = process.env.JOBS_CHUNK_PAUSE_MS;

beforeAll(() => {
  process.env.JOBS_CHUNK_PAUSE_MS = '150';
});
afterAll(async () => {
  for (const s of servers) await s.close();
  if (saved === undefined) delete process.env.JOBS_CHUNK_PAUSE_MS;
  else process.env.JOBS_CHUNK_PAUSE_MS = saved;
  await pool.end();
});

async function signedIn(url: string, user: { email: string; password: string }) {
  const agent = request.agent(url);
  const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
  expect(res.status).toBe(200);
  return agent;
}

async function waitFor<T>(read: () => Promise<T>, done: (value: T) => boolean, timeoutMs: number): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > until) throw new Error(`timed out waiting; last value ${JSON.stringify(value).slice(0, 300)}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

describe('queued Property spread (pg-boss) across a server restart', () => {
  it('finishes a 20 000-sample spread after the server stops mid-run, continuing from the stored chunks', async () => {
    const user = await createTestUser(db, { role: 'engineer' });
    const serverA = await startServer({ port: 0, host: '127.0.0.1' });
    servers.push(serverA);
    let agent = await signedIn(serverA.url, user);

    const fluid = await agent.post('/api/fluids').send({
      name: `Queue fluid ${Date.now()}`,
      ...roundFluid,
    });
    expect(fluid.status).toBe(201);
    // Ma = 100·ΔT at 1 mm (hand calculation); ΔT = 0.79607 K is Pearson's onset Ma_c = 79.607 (Pearson 1958).
    const check = await agent.post('/api/layer-checks').send({
      title: `Queued spread ${Date.now()}`,
      fluidId: fluid.body.id,
      processKind: 'general-layer',
      temperature: '20 °C',
      depth: '1 mm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      deformableSurface: false,
      heating: { mode: 'deltaT', deltaT: '0.79607 K' },
    });
    expect(check.status).toBe(201);

    const started = await agent
      .post(`/api/layer-checks/${check.body.id}/spreads`)
      .send({ samples: 20_000, seed: 2024, uncertainties: [{ name: 'deltaT', uncertaintyPercent: 10, distribution: 'uniform' }] });
    expect(started.status).toBe(202);
    expect(started.body.status).toBe('queued');
    const id = started.body.id as string;

    const mid = await waitFor(
      async () => (await agent.get(`/api/property-spreads/${id}`)).body,
      (s) => s.progress >= 0.15,
      60_000,
    );
    expect(mid.status).toBe('running');
    expect(mid.progress).toBeLessThan(1);

    await serverA.close();
    servers = servers.filter((s) => s !== serverA);
    const restartedAt = new Date();
    const [afterStop] = await db.select().from(propertySpreads).where(eq(propertySpreads.id, id));
    expect(afterStop.status).toBe('running');
    expect(afterStop.evaluatedSamples).toBeGreaterThan(0);
    expect(afterStop.evaluatedSamples).toBeLessThan(20_000);
    const storedBefore = afterStop.evaluatedSamples;

    const serverB = await startServer({ port: 0, host: '127.0.0.1' });
    servers.push(serverB);
    agent = await signedIn(serverB.url, user);
    const finished = await waitFor(
      async () => (await agent.get(`/api/property-spreads/${id}`)).body,
      (s) => s.status === 'done' || s.status === 'failed',
      90_000,
    );
    expect(finished.status).toBe('done');
    expect(finished.progress).toBe(1);

    // Every chunk is stored once, contiguous from 0; the ones before the restart were not recomputed.
    const chunks = await db
      .select({ start: propertySpreadChunks.start, end: propertySpreadChunks.end, createdAt: propertySpreadChunks.createdAt })
      .from(propertySpreadChunks)
      .where(eq(propertySpreadChunks.spreadId, id))
      .orderBy(asc(propertySpreadChunks.start));
    expect(chunks[0].start).toBe(0);
    expect(chunks.at(-1)!.end).toBe(20_000);
    chunks.slice(1).forEach((c, i) => expect(c.start).toBe(chunks[i].end));
    const early = chunks.filter((c) => c.end <= storedBefore);
    expect(early.length).toBeGreaterThan(0);
    for (const c of early) expect(c.createdAt.getTime()).toBeLessThan(restartedAt.getTime());
    expect(chunks.some((c) => c.createdAt.getTime() >= restartedAt.getTime())).toBe(true);

    // The resumed run equals one uninterrupted pass over the same plan (same seed → same samples).
    const [row] = await db.select().from(propertySpreads).where(eq(propertySpreads.id, id));
    const plan = row.plan as SpreadPlan;
    const chosen = createLayerSpreadEvaluator(row.layer as PhysicalLayer, plan.properties, { seed: plan.seed });
    const oneShot = JSON.parse(JSON.stringify(summarizeSpread(plan, runSpreadChunk(plan, { start: 0, count: plan.samples }, chosen.evaluate))));
    const { swing: _swing, method: _method, fallbackReason: _reason, ...summary } = finished.result;
    expect(summary).toEqual(oneShot);
    // And it agrees with the closed form at onset: P(margin < 1) = P(f > 1) = ½ for f ~ U(0.9, 1.1) (derived).
    expect(Math.abs(finished.result.onsetProbability - 0.5)).toBeLessThan(0.02);
  }, 180_000);
});
