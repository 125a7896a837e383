/**
 * Fault: SIGTERM while requests are in flight (a deploy or a container stop). The server stops
 * accepting, lets the request in flight finish against the database, stops the dispatcher, closes the
 * database pool ("QuietLayer stopped" is logged after pool.end() resolves, server/index.ts), and exits 0.
 * Requests whose clients already hung up (a load generator that gave up) still finish their work
 * before the pool closes (server/http/in-flight-work.ts).
 */
import { spawn } from 'node:child_process';
import http from 'node:http';
import path from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runDemoSeed } from '../../scripts/lib/seed/run-demo-seed';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';

const root = path.resolve(import.meta.dirname, '..', '..');
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
let scratch: ScratchDatabase;
beforeAll(async () => {
  scratch = await createScratchDatabase();
  await runDemoSeed(scratch.url, { bcryptCost: 4, log: () => {} });
}, 60_000);
afterAll(async () => {
  await scratch?.drop();
});

async function query<Row>(connectionString: string | undefined, text: string, values: unknown[]): Promise<Row[]> {
  const client = new pg.Client({ connectionString });
  await client.connect();
  try {
    return (await client.query(text, values)).rows as Row[];
  } finally {
    await client.end();
  }
}

async function connectionsNamed(applicationName: string): Promise<number> {
  const rows = await query<{ n: number }>(
    process.env.QUIETLAYER_TEST_ADMIN_URL,
    'select count(*)::int as n from pg_stat_activity where application_name = $1',
    [applicationName],
  );
  return rows[0].n;
}

/**
 * Runs server/index.ts on the scratch database; resolves once it logs where it listens. Node loads
 * tsx as a hook (not the tsx command) so SIGTERM reaches the server itself: the tsx command re-sends
 * the signal and then SIGKILLs a child whose event loop did not acknowledge it within 30 ms.
 */
async function startServerChild(applicationName: string) {
  const databaseUrl = `${scratch.url}?application_name=${applicationName}`;
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: databaseUrl, PORT: '0', LOG_LEVEL: 'info', SMTP_FAKE_PORT: '9', JOBS_ENABLED: 'false' },
  });
  let stdout = '';
  const exited = new Promise<number | null>((resolve) => child.on('exit', resolve));
  const url = await new Promise<string>((resolve, reject) => {
    child.stdout.on('data', (chunk) => {
      stdout += chunk;
      const match = /"url":"(http:\/\/[^"]+)"/.exec(stdout);
      if (match) resolve(match[1]);
    });
    child.on('exit', (code) => reject(new Error(`exited early with ${code}: ${stdout}`)));
  });
  return { child, url, exited, stdout: () => stdout };
}

describe('SIGTERM', () => {
  it('finishes the request in flight (a sign-in against the database), closes the pool and exits 0', async () => {
    const applicationName = `ql_sigterm_${process.pid}_${Date.now()}`;
    const { child, url, exited, stdout } = await startServerChild(applicationName);
    expect((await fetch(`${url}/api/health`)).status).toBe(200);
    expect(await connectionsNamed(applicationName)).toBeGreaterThan(0);

    // Start a sign-in whose body is still arriving when SIGTERM comes.
    const body = JSON.stringify({ email: 'engineer@larkspur.example', password: 'quietlayer-demo' });
    const { port } = new URL(url);
    const req = http.request({
      host: '127.0.0.1',
      port,
      method: 'POST',
      path: '/api/auth/sign-in',
      headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) },
    });
    const answered = new Promise<{ status: number; body: string }>((resolve, reject) => {
      req.on('response', (res) => {
        let text = '';
        res.on('data', (chunk) => (text += chunk));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, body: text }));
      });
      req.on('error', reject);
    });
    req.write(body.slice(0, 10));
    await new Promise((resolve) => setTimeout(resolve, 200));

    child.kill('SIGTERM');
    await new Promise((resolve) => setTimeout(resolve, 500));
    // A new connection is refused while the old request is still open.
    await expect(fetch(`${url}/api/health`)).rejects.toThrow();
    req.end(body.slice(10));

    const inFlight = await answered;
    expect(inFlight.status).toBe(200);
    expect(JSON.parse(inFlight.body).user.email).toBe('engineer@larkspur.example');
    expect(await exited).toBe(0);
    expect(stdout()).toMatch(/QuietLayer stopped/);
    expect(await connectionsNamed(applicationName)).toBe(0);
  }, 120_000);

  it('lets sign-ins whose clients hung up finish before the pool closes (no "pool after end" 500s)', async () => {
    // Each sign-in below reads the user, clears one earlier failed attempt (an UPDATE of users) and
    // then writes its audit event. The test holds a SHARE lock on users, so all of them wait at that
    // UPDATE, inside their handler and holding a pool connection, while their clients hang up and
    // SIGTERM arrives; the lock is let go only once shutdown has begun. The audit event is then a
    // query issued after close() has started: it must still find the pool open.
    const email = 'technician@larkspur.example';
    const signIns = 8; // under the pool's 10 connections, so every one of them can be waiting at once
    const signedInEvents = async () =>
      (
        await query<{ n: number }>(
          scratch.url,
          `select count(*)::int as n from audit_events
            where action = 'user.signed_in' and entity_id = (select id::text from users where email = $1)`,
          [email],
        )
      )[0].n;
    const eventsBefore = await signedInEvents();
    await query(scratch.url, 'update users set failed_sign_ins = 1, locked_until = null where email = $1', [email]);

    const applicationName = `ql_sigterm_hangup_${process.pid}_${Date.now()}`;
    const { child, url, exited, stdout } = await startServerChild(applicationName);
    expect((await fetch(`${url}/api/health`)).status).toBe(200);

    const holder = new pg.Client({ connectionString: scratch.url });
    await holder.connect();
    try {
      await holder.query('begin');
      await holder.query('lock table users in share mode');

      const body = JSON.stringify({ email, password: 'quietlayer-demo' });
      const { port } = new URL(url);
      const requests = Array.from({ length: signIns }, () => {
        const req = http.request({
          host: '127.0.0.1',
          port,
          method: 'POST',
          path: '/api/auth/sign-in',
          headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) },
        });
        req.on('error', () => {}); // the hang-up below
        req.end(body);
        return req;
      });
      const waitingOnTheLock = async () =>
        (
          await query<{ n: number }>(
            process.env.QUIETLAYER_TEST_ADMIN_URL,
            `select count(*)::int as n from pg_stat_activity where application_name = $1 and wait_event_type = 'Lock'`,
            [applicationName],
          )
        )[0].n;
      while ((await waitingOnTheLock()) < signIns) await sleep(50);

      // The client gives up on every request, then the server is told to stop.
      for (const req of requests) req.destroy();
      child.kill('SIGTERM');
      while (!stdout().includes('"msg":"shutting down"')) await sleep(20);
      // Give close() time to get past server.close() (no connections are left) before the sign-ins go on.
      await sleep(500);
      await holder.query('commit');
    } finally {
      await holder.end();
      if (child.exitCode === null) setTimeout(() => child.kill('SIGKILL'), 30_000).unref();
    }

    expect(await exited).toBe(0);
    const errors = stdout()
      .split('\n')
      .filter((line) => line.startsWith('{'))
      .map((line) => JSON.parse(line) as { level: number; msg?: string; err?: { message?: string } })
      .filter((line) => line.level >= 50)
      .map((line) => `${line.msg}: ${line.err?.message ?? ''}`);
    expect(errors).toEqual([]);
    expect(stdout()).not.toMatch(/Cannot use a pool after calling end/);
    expect(stdout()).toMatch(/QuietLayer stopped/);
    // Every abandoned sign-in finished its work, audit event included, and the pool is closed.
    expect((await signedInEvents()) - eventsBefore).toBe(signIns);
    expect(await connectionsNamed(applicationName)).toBe(0);
  }, 120_000);
});
