import { spawn } from 'node:child_process';
import http from 'node:http';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer } from '../../server/index';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';

// Own database: startServer runs the outbox dispatcher, which must not send other files' mail.
let scratch: ScratchDatabase;
beforeAll(async () => {
  scratch = await createScratchDatabase();
});
afterAll(async () => {
  await scratch.drop();
});

describe('startServer', () => {
  it('listens on a free port, answers, lets an in-flight request finish on close, then refuses connections', async () => {
    process.env.DATABASE_URL = scratch.url;
    process.env.SMTP_FAKE_PORT = '9';
    const started = await startServer({ port: 0, host: '127.0.0.1' });
    expect(started.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
    expect(started.url).not.toMatch(/:0$/);

    const health = await fetch(`${started.url}/api/health`);
    expect(health.status).toBe(200);
    expect(await health.json()).toEqual({ status: 'ok', database: 'up' });

    // A request whose body is still arriving when close() is called must still be answered.
    const body = JSON.stringify({ email: 'nobody-in-flight@larkspur.example', password: 'not-a-real-password' });
    const { port } = new URL(started.url);
    let inFlightRequest: http.ClientRequest | undefined;
    const inFlight = new Promise<number>((resolve, reject) => {
      const req = http.request(
        { host: '127.0.0.1', port, method: 'POST', path: '/api/auth/sign-in', headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) } },
        (res) => {
          res.resume();
          res.on('end', () => resolve(res.statusCode ?? 0));
        },
      );
      req.on('error', reject);
      req.write(body.slice(0, 10));
      inFlightRequest = req;
    });
    await new Promise((resolve) => setTimeout(resolve, 300)); // the server (same process) takes the connection meanwhile
    const closed = started.close();
    inFlightRequest!.end(body.slice(10));
    expect(await inFlight).toBe(401);
    await closed;
    await expect(fetch(`${started.url}/api/health`)).rejects.toThrow();
  });
});

describe('tsx server/index.ts', () => {
  it('refuses a production start with the development session secret, with a clear message', async () => {
    const root = path.resolve(import.meta.dirname, '..', '..');
    const child = spawn(path.join(root, 'node_modules', '.bin', 'tsx'), ['server/index.ts'], {
      cwd: root,
      env: { ...process.env, DATABASE_URL: scratch.url, NODE_ENV: 'production', QUIETLAYER_MODE: 'production', SESSION_SECRET: '', BCRYPT_COST: '12' },
    });
    let stderr = '';
    child.stderr.on('data', (chunk) => (stderr += chunk));
    const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
    expect(code).toBe(1);
    expect(stderr).toMatch(/SESSION_SECRET/);
    expect(stderr).toMatch(/production/);
  }, 120_000);

  it('starts, then shuts down cleanly on SIGTERM', async () => {
    const root = path.resolve(import.meta.dirname, '..', '..');
    const child = spawn(path.join(root, 'node_modules', '.bin', 'tsx'), ['server/index.ts'], {
      cwd: root,
      env: { ...process.env, DATABASE_URL: scratch.url, PORT: '0', LOG_LEVEL: 'info', SMTP_FAKE_PORT: '9' },
    });
    let stdout = '';
    const listening = new Promise<string>((resolve, reject) => {
      child.stdout.on('data', (chunk) => {
        stdout += chunk;
        const match = /"url":"(http:\/\/[^"]+)"/.exec(stdout);
        if (match) resolve(match[1]);
      });
      child.on('exit', (code) => reject(new Error(`exited early with ${code}: ${stdout}`)));
    });
    const url = await listening;
    expect((await fetch(`${url}/api/health`)).status).toBe(200);
    const exited = new Promise<number | null>((resolve) => child.on('exit', resolve));
    child.kill('SIGTERM');
    expect(await exited).toBe(0);
    expect(stdout).toMatch(/QuietLayer stopped/);
  }, 120_000);
});
