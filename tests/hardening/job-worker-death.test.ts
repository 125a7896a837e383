/**
 * Fault: the process running a queued job is killed outright (SIGKILL: no shutdown, its job is left
 * 'active'). pg-boss expires an active job whose worker stopped answering after the queue's
 * expireInSeconds (15 min, server/jobs/start-jobs.ts) and puts it back for retry; the next worker then
 * finishes it from the chunks already stored.
 *
 * The 15 minutes are not waited for: the test moves the dead job's start time back 16 minutes (the
 * same row pg-boss's expiry query reads: `started_on + expire_in < now()`) and runs pg-boss's own
 * maintenance once a second through a supervising instance. Everything after that is the real path.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import PgBoss from 'pg-boss';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDatabase } from '../../server/db/client';
import { propertySpreads } from '../../server/db/schema/beyond-onset';
import { startServer, type StartedServer } from '../../server/index';
import { SPREAD_QUEUE } from '../../server/jobs/start-jobs';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';
import { createTestUser } from '../integration/helpers/users';
import { roundFluid } from '../integration/helpers/round-fluid';

const root = path.resolve(import.meta.dirname, '..', '..');
let scratch: ScratchDatabase;
let database: ReturnType<typeof createDatabase>;
let child: ChildProcess | undefined;
let serverB: StartedServer | undefined;
let supervisor: PgBoss | undefined;
const savedEnv = { DATABASE_URL: process.env.DATABASE_URL, SMTP_FAKE_PORT: process.env.SMTP_FAKE_PORT };

beforeAll(async () => {
  scratch = await createScratchDatabase();
  database = createDatabase(scratch.url, { max: 2 });
}, 60_000);
afterAll(async () => {
  if (child && child.exitCode === null) child.kill('SIGKILL');
  await supervisor?.stop({ graceful: false, wait: true }).catch(() => {});
  await serverB?.close();
  Object.assign(process.env, savedEnv);
  await database?.pool.end();
  await scratch?.drop();
}, 60_000);

async function waitFor<T>(read: () => Promise<T>, done: (value: T) => boolean, ms: number): Promise<T> {
  const until = Date.now() + ms;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > until) throw new Error(`timed out; last value ${JSON.stringify(value).slice(0, 300)}`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

describe('a queued job whose worker dies', () => {
  it('is retried by the next worker after expiry and finishes from the stored chunks', async () => {
    const user = await createTestUser(database.db, { role: 'engineer' });
    child = spawn(path.join(root, 'node_modules', '.bin', 'tsx'), ['server/index.ts'], {
      cwd: root,
      env: { ...process.env, DATABASE_URL: scratch.url, PORT: '0', LOG_LEVEL: 'info', SMTP_FAKE_PORT: '9', JOBS_CHUNK_PAUSE_MS: '200' },
    });
    let stdout = '';
    const url = await new Promise<string>((resolve, reject) => {
      child!.stdout!.on('data', (chunk) => {
        stdout += chunk;
        const match = /"url":"(http:\/\/[^"]+)"/.exec(stdout);
        if (match) resolve(match[1]);
      });
      child!.on('exit', (code) => reject(new Error(`worker A exited early (${code})`)));
    });
    const agent = request.agent(url);
    expect((await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password })).status).toBe(200);
    const fluid = await agent.post('/api/fluids').send({
      name: 'Worker death fluid',
      ...roundFluid,
    });
    expect(fluid.status).toBe(201);
    const check = await agent.post('/api/layer-checks').send({
      title: 'Worker death check',
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
      .send({ samples: 20_000, seed: 8, uncertainties: [{ name: 'deltaT', uncertaintyPercent: 10, distribution: 'uniform' }] });
    expect(started.status).toBe(202);
    const id = started.body.id as string;
    const spread = () => database.db.select().from(propertySpreads).where(eq(propertySpreads.id, id)).then((rows) => rows[0]);
    await waitFor(spread, (s) => s.evaluatedSamples > 0 && s.evaluatedSamples < 20_000, 60_000);

    // Worker A dies without any shutdown.
    const exited = new Promise((resolve) => child!.once('exit', resolve));
    child.kill('SIGKILL');
    await exited;
    const storedBefore = (await spread()).evaluatedSamples;
    const jobState = async () =>
      (await database.pool.query<{ state: string; retry_count: number }>(`select state, retry_count from pgboss.job where name = $1 and data->>'spreadId' = $2`, [SPREAD_QUEUE, id])).rows[0];
    expect((await jobState()).state).toBe('active');

    // 16 minutes pass (see the header), and pg-boss's maintenance runs.
    await database.pool.query(`update pgboss.job set started_on = started_on - interval '16 minutes' where name = $1 and data->>'spreadId' = $2`, [SPREAD_QUEUE, id]);
    await database.pool.query(`update pgboss.version set maintained_on = null`);
    supervisor = new PgBoss({ connectionString: scratch.url, max: 2, schedule: false, supervise: true, maintenanceIntervalSeconds: 1 });
    supervisor.on('error', () => {});
    await supervisor.start();
    const retried = await waitFor(jobState, (j) => j.state === 'retry' || j.state === 'created', 30_000);
    expect(retried.state, JSON.stringify(retried)).toBe('retry');
    await supervisor.stop({ graceful: false, wait: true });
    supervisor = undefined;

    // Worker B starts and finishes the spread from where A left it.
    process.env.DATABASE_URL = scratch.url;
    process.env.SMTP_FAKE_PORT = '9';
    serverB = await startServer({ port: 0, host: '127.0.0.1' });
    const finished = await waitFor(spread, (s) => s.status === 'done' || s.status === 'failed', 120_000);
    expect(finished.status).toBe('done');
    expect(finished.evaluatedSamples).toBe(20_000);
    expect(storedBefore).toBeGreaterThan(0);
    const done = await jobState();
    expect(done.state).toBe('completed');
    expect(done.retry_count).toBeGreaterThanOrEqual(1);
  }, 300_000);
});
