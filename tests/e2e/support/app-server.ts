/**
 * The real QuietLayer for browser tests: its own freshly migrated database seeded with the demo
 * scenario, the local SMTP fake, and the real server (startServer) serving the built client.
 * A database of its own keeps this server's mail dispatcher away from other test files' outbox.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { buildClientIfStale, clientBuildIsStale } from '../../../scripts/lib/build-client';
import { projectRoot } from '../../../scripts/lib/project-root';
import { runDemoSeed } from '../../../scripts/lib/seed/run-demo-seed';
import { createDatabase } from '../../../server/db/client';
import { startServer } from '../../../server/index';
import { startSmtpFake } from '../../../server/mail';
import { createScratchDatabase } from '../../setup/scratch-database';

export interface TestApp {
  /** Base URL, e.g. http://127.0.0.1:40123 */
  url: string;
  close(): Promise<void>;
}

export async function startTestApp(): Promise<TestApp> {
  // `npm test` builds the client first; a direct `npx vitest run tests/e2e` builds it here once.
  // A stale build is not rebuilt here (parallel test files would build into dist/ at the same time),
  // but it is named, so nobody reads a browser test of old client code as a test of the new.
  if (!existsSync(join(projectRoot, 'dist', 'client', 'index.html'))) await buildClientIfStale();
  else if (clientBuildIsStale()) {
    console.warn('dist/client is older than its sources: these browser tests run the old client. Run `npm run build` first (npm test does).');
  }

  const database = await createScratchDatabase();
  await runDemoSeed(database.url, { bcryptCost: 4, log: () => {} });
  const mailDb = createDatabase(database.url, { max: 2 });
  const smtpFake = await startSmtpFake({ db: mailDb.db, port: 0 });

  const saved = { DATABASE_URL: process.env.DATABASE_URL, SMTP_FAKE_PORT: process.env.SMTP_FAKE_PORT, PUBLIC_URL: process.env.PUBLIC_URL };
  process.env.DATABASE_URL = database.url;
  process.env.SMTP_FAKE_PORT = String(smtpFake.port);
  delete process.env.PUBLIC_URL; // mail links then point at the port the server really listens on
  let server;
  try {
    server = await startServer({ port: 0, host: '127.0.0.1' });
  } finally {
    for (const [key, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
  }

  return {
    url: server.url,
    async close() {
      await server.close();
      await smtpFake.close();
      await mailDb.pool.end();
      await database.drop();
    },
  };
}
