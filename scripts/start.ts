/**
 * `npm start`: database up, migrated and (in demo mode) seeded; client built if stale; local
 * SMTP fake (unless SMTP_URL) and the API server in this process. Ctrl-C / SIGTERM stops the
 * server, the fake, and PostgreSQL if this command started it.
 */
import type { ChildProcess } from 'node:child_process';
import { createDatabase } from '../server/db/client';
import { startSmtpFake } from '../server/mail/smtp-fake';
import { prepareAppDatabase } from './lib/app-database';
import { buildClientIfStale } from './lib/build-client';
import { describeDemoSignIns } from './lib/demo-sign-ins';
import { quietlayerMode } from './lib/quietlayer-mode';
import { runMain } from './lib/setup-error';
import { onShutdown, shutdown } from './lib/shutdown';

runMain(async () => {
  const mode = quietlayerMode();
  process.env.QUIETLAYER_MODE = mode;

  const { databaseUrl, postgres } = await prepareAppDatabase();
  onShutdown('PostgreSQL', () => postgres.stop());

  let build: ChildProcess | undefined;
  onShutdown('client build', () => {
    if (build && build.exitCode === null) build.kill('SIGTERM');
  });
  await buildClientIfStale({ track: (child) => (build = child) });

  process.env.DATABASE_URL = databaseUrl;

  if (!process.env.SMTP_URL) {
    const mailDatabase = createDatabase(databaseUrl, { max: 2 });
    onShutdown('mail fake database pool', () => mailDatabase.pool.end());
    const fakePort = Number(process.env.SMTP_FAKE_PORT || 2525);
    const fake = await startSmtpFake({ db: mailDatabase.db, port: fakePort }).catch((error: Error) => {
      throw new Error(
        `The local mail fake could not listen on 127.0.0.1:${fakePort} (${error.message}). ` +
          'Set SMTP_FAKE_PORT to a free port, or SMTP_URL to a real relay.',
      );
    });
    process.env.SMTP_FAKE_PORT = String(fake.port);
    onShutdown('mail fake', () => fake.close());
    console.log(
      mode === 'demo'
        ? `Mail: local fake on 127.0.0.1:${fake.port} (messages appear under Outbox)`
        : `Mail: SMTP_URL is not set, so messages go to the local fake on 127.0.0.1:${fake.port}; set SMTP_URL to reach people`,
    );
  } else {
    console.log('Mail: sending through SMTP_URL');
  }

  // Imported only now: server/env.ts reads DATABASE_URL and the rest of the environment.
  const { startServer } = await import('../server/index');
  const server = await startServer();
  onShutdown('server', () => server.close());

  console.log(`\nQuietLayer is running at ${server.url}`);
  if (mode === 'demo') console.log(describeDemoSignIns());
  else console.log('Production mode: no demo sign-ins.');
  console.log('Press Ctrl-C to stop.\n');
});

process.on('uncaughtException', (error) => {
  console.error('Unexpected error:', error);
  void shutdown(1);
});
