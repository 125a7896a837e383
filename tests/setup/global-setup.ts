/**
 * Runs once per `vitest run`, before any worker starts (workers inherit process.env):
 * makes PostgreSQL available (so a plain `npx vitest run` works too), creates a fresh database
 * for this run, migrates it, seeds the demo users, and drops the database afterwards.
 */
import { createDatabaseIfMissing, databaseUrlFor, dropDatabase, listDatabases, migrateDatabase } from '../../scripts/lib/database';
import { ensurePostgres } from '../../scripts/lib/postgres';
import { runDemoSeed } from '../../scripts/lib/seed/run-demo-seed';
import { TEST_DATABASE_PREFIX, TEST_SESSION_SECRET } from './test-environment';

/** Test databases older than this are left-overs of runs that were killed; they are dropped. */
const STALE_AFTER_MS = 6 * 60 * 60 * 1000;

export default async function setup(): Promise<() => Promise<void>> {
  const postgres = await ensurePostgres({ log: () => {} });
  const adminUrl = postgres.adminUrl;
  await dropStaleTestDatabases(adminUrl);

  const name = `${TEST_DATABASE_PREFIX}${Date.now()}_${process.pid}`;
  await createDatabaseIfMissing(adminUrl, name);
  const databaseUrl = databaseUrlFor(adminUrl, name);
  await migrateDatabase(databaseUrl);

  process.env.QUIETLAYER_TEST_ADMIN_URL = adminUrl;
  process.env.DATABASE_URL = databaseUrl;
  process.env.QUIETLAYER_MODE = 'demo';
  process.env.NODE_ENV = 'test';
  process.env.BCRYPT_COST = '4';
  process.env.SESSION_SECRET = TEST_SESSION_SECRET;
  process.env.LOG_LEVEL ??= 'silent';
  await runDemoSeed(databaseUrl, { bcryptCost: 4, log: () => {} });

  return async () => {
    await dropDatabase(adminUrl, name);
    await postgres.stop();
  };
}

async function dropStaleTestDatabases(adminUrl: string): Promise<void> {
  const now = Date.now();
  for (const name of await listDatabases(adminUrl, TEST_DATABASE_PREFIX)) {
    const createdAt = Number(name.slice(TEST_DATABASE_PREFIX.length).split('_')[0]);
    if (Number.isFinite(createdAt) && now - createdAt > STALE_AFTER_MS) await dropDatabase(adminUrl, name);
  }
}
