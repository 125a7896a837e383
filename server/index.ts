import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { fileURLToPath } from 'node:url';
import type { Express } from 'express';
import { createApp } from './app';
import { createDatabase } from './db/client';
import { loadEnv } from './env';
import { createInFlightWork } from './http/in-flight-work';
import { createLogger } from './logger';
import { createMailTransport, startOutboxDispatcher } from './mail';
import { startServerJobs } from './jobs/start-server-jobs';

export interface StartedServer {
  /** Where the app answers, e.g. http://127.0.0.1:3000 (the real port when 0 was asked for). */
  url: string;
  /**
   * Stop accepting, let requests in flight finish (also those whose client has hung up), stop the
   * mail dispatcher, the job queue and the transport, close the pool. Ends within about 10 s.
   */
  close(): Promise<void>;
  app: Express;
}

/**
 * Start QuietLayer: parse the environment, connect the pool, start the outbox dispatcher and
 * listen. The local SMTP fake (demo mode without SMTP_URL) is started by the caller
 * (scripts/start.ts), not here.
 */
export async function startServer(options: { port?: number; host?: string } = {}): Promise<StartedServer> {
  const env = loadEnv();
  const logger = createLogger(env.LOG_LEVEL);
  const host = options.host ?? env.HOST;
  const port = options.port ?? env.PORT;

  const server = http.createServer();
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  const address = server.address() as AddressInfo;
  const url = `http://${address.family === 'IPv6' ? `[${address.address}]` : address.address}:${address.port}`;
  // Links in mail point at PUBLIC_URL; when it was not given, use where we really listen.
  const publicUrl = process.env.PUBLIC_URL ? env.PUBLIC_URL : url;

  const { db, pool } = createDatabase(env.DATABASE_URL);
  // Route work still running; close() waits for it before closing the pool (server/http/in-flight-work.ts).
  const inFlightWork = createInFlightWork();
  const app = createApp({ db, env: { ...env, PORT: address.port, PUBLIC_URL: publicUrl }, logger, inFlightWork });
  server.on('request', app);

  // Job queue and its worker (large Property spreads); JOBS_ENABLED=false leaves them off.
  const jobs = await startServerJobs({ databaseUrl: env.DATABASE_URL, db, logger });

  const transport = createMailTransport({ smtpUrl: env.SMTP_URL, fakePort: env.SMTP_FAKE_PORT });
  const dispatcher = startOutboxDispatcher({
    db,
    transport,
    from: env.MAIL_FROM,
    onError: (error, messageId) => logger.warn({ err: error, messageId }, 'mail delivery attempt failed'),
  });
  logger.info({ url, mode: env.QUIETLAYER_MODE }, 'QuietLayer is listening');

  let closing: Promise<void> | undefined;
  const close = () => {
    closing ??= (async () => {
      const stopped = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeIdleConnections();
      // Requests still running after 10 s are cut off so shutdown always ends.
      let forced = false;
      let giveUp = () => {};
      const gaveUp = new Promise<void>((resolve) => (giveUp = resolve));
      const force = setTimeout(() => {
        forced = true;
        server.closeAllConnections();
        giveUp();
      }, 10_000);
      force.unref();
      await stopped;
      // A closed connection does not stop its handler (the client may simply have hung up): wait
      // for the route work itself, so no handler finds the pool ended under it.
      const running = inFlightWork.count();
      if (running > 0) logger.info({ running }, 'waiting for requests in flight to finish');
      await Promise.race([inFlightWork.settled(), gaveUp]);
      clearTimeout(force);
      if (forced && inFlightWork.count() > 0) {
        logger.warn({ running: inFlightWork.count() }, 'requests still running after 10 s; closing the pool under them');
      }
      await dispatcher.stop();
      await jobs.stop();
      transport.close();
      await pool.end();
      logger.info('QuietLayer stopped');
    })();
    return closing;
  };
  return { url, close, app };
}

const runDirectly = process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1];
if (runDirectly) {
  const fallbackLogger = createLogger(process.env.LOG_LEVEL ?? 'info');
  process.on('uncaughtException', (error) => {
    fallbackLogger.fatal({ err: error }, 'uncaught exception; exiting');
    process.exit(1);
  });
  process.on('unhandledRejection', (reason) => {
    fallbackLogger.fatal({ err: reason }, 'unhandled promise rejection; exiting');
    process.exit(1);
  });
  startServer()
    .then((started) => {
      let stopping = false;
      const stop = (signal: string) => {
        if (stopping) return;
        stopping = true;
        fallbackLogger.info({ signal }, 'shutting down');
        started.close().then(
          () => process.exit(0),
          (error) => {
            fallbackLogger.error({ err: error }, 'shutdown failed');
            process.exit(1);
          },
        );
      };
      process.on('SIGTERM', () => stop('SIGTERM'));
      process.on('SIGINT', () => stop('SIGINT'));
    })
    .catch((error: unknown) => {
      // EnvError messages are written for people: print them plainly.
      console.error(error instanceof Error ? error.message : error);
      process.exit(1);
    });
}
