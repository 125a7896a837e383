/**
 * For a test file that must own a whole database (e.g. one that drains every pending outbox
 * message and would otherwise send other files' mail): a freshly created and migrated database
 * on the run's PostgreSQL server, dropped again with drop().
 */
import { randomBytes } from 'node:crypto';
import { createDatabaseIfMissing, databaseUrlFor, dropDatabase, migrateDatabase } from '../../scripts/lib/database';
import { TEST_DATABASE_PREFIX } from './test-environment';

export interface ScratchDatabase {
  url: string;
  drop(): Promise<void>;
}

export async function createScratchDatabase(): Promise<ScratchDatabase> {
  const adminUrl = process.env.QUIETLAYER_TEST_ADMIN_URL;
  if (!adminUrl) throw new Error('QUIETLAYER_TEST_ADMIN_URL is unset: run tests through vitest (tests/setup/global-setup.ts)');
  const name = `${TEST_DATABASE_PREFIX}${Date.now()}_${process.pid}_${randomBytes(3).toString('hex')}`;
  await createDatabaseIfMissing(adminUrl, name);
  const url = databaseUrlFor(adminUrl, name);
  await migrateDatabase(url);
  return { url, drop: () => dropDatabase(adminUrl, name) };
}
