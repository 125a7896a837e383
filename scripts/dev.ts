/**
 * `npm run dev`: the same database set-up as `npm start`, then the API server restarted on every
 * change (tsx watch) and the Vite dev server with hot reload, which proxies /api to the API.
 * Ctrl-C stops both, the mail fake, and PostgreSQL if this command started it.
 */
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { createServer } from 'vite';
import { createDatabase } from '../server/db/client';
import { startSmtpFake } from '../server/mail/smtp-fake';
import { prepareAppDatabase } from './lib/app-database';
import { describeDemoSignIns } from './lib/demo-sign-ins';
import { projectRoot } from './lib/project-root';
import { quietlayerMode } from './lib/quietlayer-mode';
import { runMain } from './lib/setup-error';
import { onShutdown } from './lib/shutdown';

runMain(async () => {
  const mode = quietlayerMode();
  process.env.QUIETLAYER_MODE = mode;
  process.env.PORT ||= '3000';

  const { databaseUrl, postgres } = await prepareAppDatabase();
  onShutdown('PostgreSQL', () => postgres.stop());
  process.env.DATABASE_URL = databaseUrl;

  if (!process.env.SMTP_URL) {
    const mailDatabase = createDatabase(databaseUrl, { max: 2 });
    onShutdown('mail fake database pool', () => mailDatabase.pool.end());
    const fake = await startSmtpFake({ db: mailDatabase.db, port: Number(process.env.SMTP_FAKE_PORT || 2525) });
    process.env.SMTP_FAKE_PORT = String(fake.port);
    onShutdown('mail fake', () => fake.close());
  }

  // server/index.ts starts itself when run directly and shuts down gracefully on SIGTERM.
  const api = spawn(
    process.execPath,
    [join(projectRoot, 'node_modules', 'tsx', 'dist', 'cli.mjs'), 'watch', '--clear-screen=false', join(projectRoot, 'server', 'index.ts')],
    { cwd: projectRoot, stdio: 'inherit', env: process.env },
  );
  onShutdown('API server', async () => {
    if (api.exitCode !== null || api.signalCode !== null) return;
    const exited = new Promise<void>((resolve) => api.once('exit', () => resolve()));
    api.kill('SIGTERM');
    await exited;
  });

  const vite = await createServer({ configFile: join(projectRoot, 'vite.config.ts'), root: projectRoot });
  onShutdown('Vite dev server', () => vite.close());
  await vite.listen();

  console.log(`\nQuietLayer (development) — API on http://127.0.0.1:${process.env.PORT}, app with hot reload:`);
  vite.printUrls();
  if (mode === 'demo') console.log(describeDemoSignIns());
  console.log('Press Ctrl-C to stop.\n');
});
