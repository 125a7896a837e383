/**
 * Fault: a client hangs up while its JSON body is still arriving (a flaky mobile link, a gauge that
 * loses power mid-post). body-parser raises `request.aborted`; the error handler must treat it as
 * the client's doing: 400 `request_aborted`, logged below error level, never "unhandled error".
 * End to end: a real socket sends headers and part of the body, then is destroyed; the app's own
 * logger (captured in memory) is checked for level-50 lines.
 */
import http from 'node:http';
import net from 'node:net';
import type { AddressInfo } from 'node:net';
import { Writable } from 'node:stream';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { createDatabase } from '../../server/db/client';
import { loadEnv } from '../../server/env';
import { createErrorHandler } from '../../server/middleware/error-handler';

interface LogLine {
  level: number;
  msg?: string;
  code?: string;
}

function captureLogger() {
  const lines: LogLine[] = [];
  const sink = new Writable({
    write(chunk, _encoding, callback) {
      for (const text of String(chunk).split('\n')) if (text.startsWith('{')) lines.push(JSON.parse(text) as LogLine);
      callback();
    },
  });
  return { logger: pino({ level: 'debug' }, sink), lines };
}

const env = loadEnv({ ...process.env, PUBLIC_URL: 'http://quietlayer.test' });
const { db, pool } = createDatabase(env.DATABASE_URL, { max: 2 });
const captured = captureLogger();
const app = createApp({ db, env, logger: captured.logger, clientDir: '/nonexistent-quietlayer-client' });
const server = http.createServer(app);

beforeAll(async () => {
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
});
afterAll(async () => {
  await new Promise<void>((resolve) => server.close(() => resolve()));
  await pool.end();
});

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('a request body cut off by the client', () => {
  it('is answered 400 request_aborted and logged below error level (no level-50 line)', async () => {
    const { port } = server.address() as AddressInfo;
    const partial = '{"email":"someone@quietlayer.test","pass';
    const arrived = new Promise<void>((resolve) => server.once('request', () => resolve()));

    const socket = net.connect(port, '127.0.0.1');
    socket.on('error', () => {});
    await new Promise<void>((resolve) => socket.once('connect', () => resolve()));
    socket.write(
      'POST /api/auth/sign-in HTTP/1.1\r\n' +
        'Host: 127.0.0.1\r\n' +
        'Content-Type: application/json\r\n' +
        `Content-Length: ${partial.length + 500}\r\n` +
        '\r\n' +
        partial,
    );
    // The app's middleware up to express.json runs synchronously on 'request', so by the time this
    // listener (added after the app's) fires, body-parser is already waiting for the rest of the body.
    await arrived;
    socket.destroy();

    // Wait (bounded by the test timeout) for the error handler's line about this request, or for
    // an error-level line (what an unrecognised body-parser error produces).
    const settled = () => captured.lines.some((line) => line.code === 'request_aborted' || line.level >= 50);
    while (!settled()) await sleep(20);

    expect(captured.lines.filter((line) => line.level >= 50).map((line) => line.msg)).toEqual([]);
    const aborted = captured.lines.find((line) => line.code === 'request_aborted');
    expect(aborted?.level).toBe(30);
  });
});

describe('createErrorHandler with body-parser stream errors', () => {
  function run(error: object) {
    const { logger, lines } = captureLogger();
    const handler = createErrorHandler(logger);
    let status = 0;
    let body: unknown;
    const res = {
      headersSent: false,
      status(code: number) {
        status = code;
        return this;
      },
      json(value: unknown) {
        body = value;
        return this;
      },
      setHeader() {},
    };
    handler(error, {} as never, res as never, () => {});
    return { status, body, lines };
  }

  it('answers request.aborted with 400 request_aborted at info level', () => {
    const error = Object.assign(new Error('request aborted'), { type: 'request.aborted', status: 400, expected: 540, received: 40 });
    const { status, body, lines } = run(error);
    expect(status).toBe(400);
    expect(body).toEqual({ error: { code: 'request_aborted', message: 'The request body was not received in full.' } });
    expect(lines.map((line) => line.level)).toEqual([30]);
  });

  it('answers request.size.invalid with 400 request_size_invalid at warn level', () => {
    const error = Object.assign(new Error('request size did not match content length'), { type: 'request.size.invalid', status: 400 });
    const { status, body, lines } = run(error);
    expect(status).toBe(400);
    expect((body as { error: { code: string } }).error.code).toBe('request_size_invalid');
    expect(lines.map((line) => line.level)).toEqual([40]);
  });

  it('still logs an unknown error at error level with a 500', () => {
    const { status, lines } = run(new Error('boom'));
    expect(status).toBe(500);
    expect(lines.map((line) => line.level)).toEqual([50]);
  });
});
