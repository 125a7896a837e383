/**
 * Fault: SIGTERM while requests are in flight (a deploy or a container stop). The server stops
 * accepting, lets the request in flight finish against the database, stops the dispatcher, closes the
 * database pool ("QuietLayer stopped" is logged after pool.end() resolves, server/index.ts), and exits 0.
 */
import { spawn } from 'node:child_process';
import http from 'node:http';
import path from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runDemoSeed } from '../../scripts/lib/seed/run-demo-seed';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';

const root = path.resolve(import.meta.dirname, '..', '..');
let scratch: ScratchDatabase;
beforeAll(async () => {
  scratch = await createScratchDatabase();
  await runDemoSeed(scratch.url, { bcryptCost: 4, log: () => {} });
}, 60_000);
afterAll(async () => {
  await scratch?.drop();
});

async function connectionsNamed(applicationName: string): Promise<number> {
  const client = new pg.Client({ connectionString: process.env.QUIETLAYER_TEST_ADMIN_URL });
  await client.connect();
  try {
    const result = await client.query('select count(*)::int as n from pg_stat_activity where application_name = $1', [applicationName]);
    return result.rows[0].n as number;
  } finally {
    await client.end();
  }
}

describe('SIGTERM', () => {
  it('finishes the request in flight (a sign-in against the database), closes the pool and exits 0', async () => {
    const applicationName = `ql_sigterm_${process.pid}_${Date.now()}`;
    const databaseUrl = `${scratch.url}?application_name=${applicationName}`;
    const child = spawn(path.join(root, 'node_modules', '.bin', 'tsx'), ['server/index.ts'], {
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
    expect(stdout).toMatch(/QuietLayer stopped/);
    expect(await connectionsNamed(applicationName)).toBe(0);
  }, 120_000);
});
