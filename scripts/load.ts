/**
 * Load test (`npm run load`): QuietLayer under sustained requests on this machine, loopback only.
 *
 *   1. a scratch database on the project's PostgreSQL (started if needed, like `npm start`), migrated,
 *      seeded with the demo users and fluids, plus 10,000 layer checks inserted directly with SQL;
 *   2. the real server (startServer, port 0) in a child process, production settings, so the load
 *      generator (autocannon, in this process) and the server do not share one event loop;
 *   3. real sessions (signed in through POST /api/auth/sign-in), then bounded autocannon runs against
 *      POST /api/layer-checks/evaluate and the main list endpoints;
 *      (each run preceded by a 2 s warm-up of the same requests, not counted in the figures);
 *   4. req/s, p50/p99 latency, the server process's CPU time per request and errors printed against the targets (issue 8: ≥ 300 evaluate req/s with
 *      p99 ≤ 50 ms; list pages p99 ≤ 100 ms with 10,000 checks; no errors). A miss is printed as MISSED;
 *      the exit code is 0 unless the run itself failed (or some request errored, with --strict).
 *
 * Options: --duration=<s> per run (default 15), --connections=<n> (default 10), --strict,
 * --only=<text> (run only the runs whose label contains the text, e.g. --only=evaluate).
 * Everything it creates (database, child server) is removed at the end, also on Ctrl-C.
 */
import { fork, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import type { createDatabase as CreateDatabase } from '../server/db/client';
import { createDatabaseIfMissing, databaseUrlFor, dropDatabase, migrateDatabase } from './lib/database';
import { ensurePostgres } from './lib/postgres';
import { runDemoSeed } from './lib/seed/run-demo-seed';
import { DEMO_PASSWORD } from './lib/seed/demo-users';

/** The parts of autocannon's programmatic API used here (the package ships no type declarations). */
interface LoadRequest {
  method?: 'GET' | 'POST';
  path?: string;
  headers?: Record<string, string>;
  body?: string;
  setupRequest?: (request: LoadRequest) => LoadRequest;
}
interface LoadOptions extends LoadRequest {
  url: string;
  duration: number;
  connections: number;
  timeout?: number;
  requests?: LoadRequest[];
}
interface LoadResult {
  errors: number;
  timeouts: number;
  non2xx: number;
  requests: { average: number; total: number };
  latency: { p50: number; p99: number };
}
const autocannon = createRequire(import.meta.url)('autocannon') as (options: LoadOptions) => Promise<LoadResult>;

const CHECKS = 10_000;
/** Seconds of uncounted requests before each measured run (see run()). */
const WARM_UP_SECONDS = 2;
const TARGETS = { evaluateRps: 300, evaluateP99Ms: 50, listP99Ms: 100 } as const;

interface RunResult {
  label: string;
  rps: number;
  p50: number;
  p99: number;
  requests: number;
  errors: number;
  verdict: string;
}

function option(name: string, fallback: number): number {
  const raw = process.argv.find((arg) => arg.startsWith(`--${name}=`))?.split('=')[1];
  const value = raw === undefined ? fallback : Number(raw);
  if (!Number.isFinite(value) || value <= 0) throw new Error(`--${name} must be a positive number, got "${raw}"`);
  return value;
}

// ------------------------------------------------------------------------------------------------
// Child mode: the server under test.
// ------------------------------------------------------------------------------------------------
async function serve(): Promise<void> {
  const { startServer } = await import('../server/index');
  const started = await startServer({ port: 0, host: '127.0.0.1' });
  process.send?.({ url: started.url });
  // The parent asks for this process's CPU time around each run, to report CPU per request.
  process.on('message', (message: { cpu?: boolean }) => {
    if (message?.cpu) {
      const used = process.cpuUsage();
      process.send?.({ cpuMicroseconds: used.user + used.system });
    }
  });
  const stop = () => void started.close().then(() => process.exit(0), () => process.exit(1));
  process.on('SIGTERM', stop);
  process.on('disconnect', stop);
}

// ------------------------------------------------------------------------------------------------
// Parent mode: data, server, sessions, runs, report.
// ------------------------------------------------------------------------------------------------
async function insertChecks(databaseUrl: string): Promise<void> {
  const { createDatabase } = await import('../server/db/client');
  const { fluids, layerChecks, users } = await import('../server/db/schema');
  const { layerCheckInputSchema, processKindValues } = await import('../shared/schemas/layer-checks');
  const { db, pool } = createDatabase(databaseUrl, { max: 2 });
  try {
    const fluidRows = await db.select({ id: fluids.id }).from(fluids);
    const [owner] = await db.select({ id: users.id, email: users.email }).from(users);
    if (fluidRows.length === 0 || !owner) throw new Error('the demo seed left no fluids or users');
    for (let start = 0; start < CHECKS; start += 1000) {
      const rows = Array.from({ length: Math.min(1000, CHECKS - start) }, (_, k) => {
        const i = start + k;
        const depthMicrons = 10 + (i % 490);
        const input = layerCheckInputSchema.parse({
          title: `Line ${1 + (i % 7)} load check ${i}`,
          fluidId: fluidRows[i % fluidRows.length].id,
          processKind: processKindValues[i % processKindValues.length],
          temperature: '40 °C',
          depth: `${depthMicrons} µm`,
          bottom: { mechanics: 'rigid', thermal: 'conducting' },
          top: 'surface',
          heating: { mode: 'deltaT', deltaT: '2 K' },
        });
        return {
          title: input.title,
          processKind: input.processKind,
          fluidId: input.fluidId,
          ownerId: owner.id,
          input,
          depthText: input.depth,
          depthSi: depthMicrons * 1e-6,
          savedMargin: i % 13 === 0 ? null : 0.2 + ((i * 7919) % 1000) / 250,
          savedRegime: 'quiet',
        };
      });
      await db.insert(layerChecks).values(rows);
    }
    await pool.query('ANALYZE');
    return;
  } finally {
    await pool.end();
  }
}

function startChild(env: NodeJS.ProcessEnv): Promise<{ child: ChildProcess; url: string }> {
  const child = fork(fileURLToPath(import.meta.url), ['--serve'], {
    env,
    execArgv: ['--import', 'tsx'],
    stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
  });
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('the server did not start within 60 s')), 60_000);
    child.once('message', (message: { url?: string }) => {
      clearTimeout(timer);
      if (message.url) resolve({ child, url: message.url });
      else reject(new Error('the server sent no URL'));
    });
    child.once('exit', (code) => reject(new Error(`the server exited early (code ${code})`)));
  });
}

async function signIn(url: string, email: string): Promise<string> {
  const response = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (response.status !== 200) throw new Error(`sign-in as ${email} failed: ${response.status} ${await response.text()}`);
  const cookie = response.headers.getSetCookie().find((c) => c.startsWith('quietlayer_session='));
  if (!cookie) throw new Error(`sign-in as ${email} set no session cookie`);
  return cookie.split(';')[0];
}

/** The server child, once started (for its CPU time). */
let serverChild: ChildProcess | undefined;

/** CPU time (user + system) the server process has used so far [µs], asked over IPC. */
function serverCpuMicroseconds(): Promise<number> {
  const child = serverChild;
  if (!child) return Promise.resolve(NaN);
  return new Promise((resolve) => {
    const onMessage = (message: { cpuMicroseconds?: number }) => {
      if (typeof message?.cpuMicroseconds !== 'number') return;
      child.off('message', onMessage);
      resolve(message.cpuMicroseconds);
    };
    child.on('message', onMessage);
    child.send({ cpu: true });
  });
}

async function run(
  label: string,
  options: LoadOptions,
  judge: (r: { rps: number; p99: number; errors: number }) => string,
): Promise<RunResult> {
  // Warm-up, not counted: the first requests to a route run before the JavaScript engine has
  // compiled its code paths, which says nothing about steady service. Errors here still count.
  const warmUp = await autocannon({ ...options, duration: WARM_UP_SECONDS, timeout: 10 });
  const warmUpErrors = warmUp.errors + warmUp.timeouts + warmUp.non2xx;
  const cpuBefore = await serverCpuMicroseconds();
  const result = await autocannon({ ...options, connections: options.connections, timeout: 10 });
  const cpuPerRequest = ((await serverCpuMicroseconds()) - cpuBefore) / 1000 / Math.max(1, result.requests.total);
  const errors = result.errors + result.timeouts + result.non2xx + warmUpErrors;
  const summary = { rps: result.requests.average, p50: result.latency.p50, p99: result.latency.p99, errors };
  const verdict = judge(summary);
  const line: RunResult = { label, ...summary, requests: result.requests.total, verdict };
  console.log(
    `  ${label.padEnd(52)} ${summary.rps.toFixed(0).padStart(6)} req/s  p50 ${String(summary.p50).padStart(4)} ms  p99 ${String(summary.p99).padStart(5)} ms  ` +
      `server CPU ${cpuPerRequest.toFixed(2)} ms/req  errors ${errors}/${result.requests.total}  ${verdict}`,
  );
  return line;
}

async function main(): Promise<void> {
  if (process.argv.includes('--serve')) return serve();
  const duration = option('duration', 15);
  const connections = option('connections', 10);
  const strict = process.argv.includes('--strict');
  const only = process.argv.find((arg) => arg.startsWith('--only='))?.slice('--only='.length);
  const wanted = (label: string) => only === undefined || label.includes(only);

  const postgres = await ensurePostgres({ log: () => {} });
  const name = `quietlayer_load_${randomBytes(4).toString('hex')}`;
  let child: ChildProcess | undefined;
  let smtpFake: { port: number; close(): Promise<void> } | undefined;
  let mailDatabase: ReturnType<typeof CreateDatabase> | undefined;
  let cleaned = false;
  const cleanUp = async () => {
    if (cleaned) return;
    cleaned = true;
    if (child && child.exitCode === null) {
      const exited = new Promise((resolve) => child!.once('exit', resolve));
      child.kill('SIGTERM');
      await exited;
    }
    await smtpFake?.close().catch(() => {});
    await mailDatabase?.pool.end().catch(() => {});
    await dropDatabase(postgres.adminUrl, name).catch(() => {});
    await postgres.stop();
  };
  process.once('SIGINT', () => void cleanUp().then(() => process.exit(130)));

  const results: RunResult[] = [];
  try {
    console.log(`Load test: ${duration} s per run, ${connections} connections, loopback only.`);
    await createDatabaseIfMissing(postgres.adminUrl, name);
    const databaseUrl = databaseUrlFor(postgres.adminUrl, name);
    await migrateDatabase(databaseUrl);
    await runDemoSeed(databaseUrl, { bcryptCost: 12, log: () => {} });
    // The seed queues mail (invitations, alerts): the local SMTP fake takes it, as under `npm start`.
    const { createDatabase } = await import('../server/db/client');
    const { startSmtpFake } = await import('../server/mail/smtp-fake');
    mailDatabase = createDatabase(databaseUrl, { max: 1 });
    smtpFake = await startSmtpFake({ db: mailDatabase.db, port: 0 });
    const insertStart = performance.now();
    await insertChecks(databaseUrl);
    console.log(`  scratch database ${name}: demo users and fluids, ${CHECKS} layer checks inserted in ${((performance.now() - insertStart) / 1000).toFixed(1)} s`);

    const server = await startChild({
      ...process.env,
      DATABASE_URL: databaseUrl,
      NODE_ENV: 'production',
      QUIETLAYER_MODE: 'production',
      SESSION_SECRET: randomBytes(48).toString('base64'),
      BCRYPT_COST: '12',
      // Request logs at info would flood this terminal; warnings and errors still show.
      LOG_LEVEL: 'warn',
      JOBS_ENABLED: 'false',
      SMTP_URL: `smtp://127.0.0.1:${smtpFake.port}`,
      PUBLIC_URL: '',
    });
    child = server.child;
    serverChild = server.child;
    const { url } = server;
    const engineer = await signIn(url, 'engineer@larkspur.example');
    const admin = await signIn(url, 'admin@larkspur.example');
    const fluidList = (await (await fetch(`${url}/api/fluids?pageSize=5`, { headers: { cookie: engineer } })).json()) as { items: { id: string; name: string }[] };
    const fluidId = fluidList.items[0]?.id;
    if (!fluidId) throw new Error('no fluid to evaluate against');
    console.log(`  server ${url} (production settings, child process); sessions for engineer and administrator`);
    console.log(`  evaluating against the demo fluid "${fluidList.items[0].name}"\n`);

    const evaluateBody = (depth: string) =>
      JSON.stringify({
        fluidId,
        processKind: 'drying-coat',
        temperature: '40 °C',
        depth,
        bottom: { mechanics: 'rigid', thermal: 'conducting' },
        top: 'surface',
        heating: { mode: 'deltaT', deltaT: '2 K' },
      });
    const common = { duration, connections };
    const evaluateVerdict = (r: { rps: number; p99: number; errors: number }) =>
      r.errors === 0 && r.rps >= TARGETS.evaluateRps && r.p99 <= TARGETS.evaluateP99Ms
        ? 'ok'
        : `MISSED (target ≥ ${TARGETS.evaluateRps} req/s, p99 ≤ ${TARGETS.evaluateP99Ms} ms, no errors)`;
    const listVerdict = (r: { p99: number; errors: number }) =>
      r.errors === 0 && r.p99 <= TARGETS.listP99Ms ? 'ok' : `MISSED (target p99 ≤ ${TARGETS.listP99Ms} ms, no errors)`;
    const jsonPost = { method: 'POST' as const, headers: { cookie: engineer, 'content-type': 'application/json' } };

    // A different depth on every request: no two bodies alike, so nothing can be answered from a memo.
    let counter = 0;
    const evaluateNew = 'POST /api/layer-checks/evaluate (every body new)';
    if (wanted(evaluateNew)) results.push(
      await run(evaluateNew, {
        ...common,
        url,
        requests: [{ ...jsonPost, path: '/api/layer-checks/evaluate', setupRequest: (req: LoadRequest) => ({ ...req, body: evaluateBody(`${(20 + (counter++ % 400_000) * 0.0005).toFixed(4)} µm`) }) }],
      }, evaluateVerdict),
    );
    // The same body again and again (a person nudging nothing, or many clients asking the same).
    const evaluateRepeated = 'POST /api/layer-checks/evaluate (one body repeated)';
    if (wanted(evaluateRepeated)) results.push(
      await run(evaluateRepeated, { ...common, url: `${url}/api/layer-checks/evaluate`, ...jsonPost, body: evaluateBody('50 µm') }, evaluateVerdict),
    );
    const lists: Array<[string, string, string]> = [
      ['GET /api/layer-checks (10,000 checks, newest, 50)', '/api/layer-checks?pageSize=50', engineer],
      ['GET /api/layer-checks (by margin, page 40, 50)', '/api/layer-checks?pageSize=50&sort=margin&dir=asc&page=40', engineer],
      ['GET /api/layer-checks (search "Line 3", 50)', '/api/layer-checks?pageSize=50&q=Line%203&sort=title', engineer],
      ['GET /api/fluids', '/api/fluids', engineer],
      ['GET /api/users (administrator)', '/api/users', admin],
      ['GET /api/audit (administrator)', '/api/audit', admin],
    ];
    for (const [label, path, cookie] of lists) {
      if (wanted(label)) results.push(await run(label, { ...common, url: `${url}${path}`, headers: { cookie } }, listVerdict));
    }

    const missed = results.filter((r) => r.verdict !== 'ok');
    const errored = results.reduce((sum, r) => sum + r.errors, 0);
    console.log(`\n${results.length - missed.length} of ${results.length} runs met their target; ${errored} requests errored.`);
    if (strict && errored > 0) process.exitCode = 1;
  } finally {
    await cleanUp();
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exit(1);
});
