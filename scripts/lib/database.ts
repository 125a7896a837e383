/** Creating, dropping and migrating databases on the server ensurePostgres() made available. */
import { join } from 'node:path';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';
import { projectRoot } from './project-root';
import { SetupError } from './setup-error';

/** Name of the application database `npm start` and `npm run dev` use. */
export const APP_DATABASE_NAME = 'quietlayer';

/** Any fixed 64-bit key: serialises concurrent migrators (several servers starting at once). */
const MIGRATION_LOCK_KEY = 727_465_301;

const databaseNamePattern = /^[a-z_][a-z0-9_]{0,62}$/;

function assertDatabaseName(name: string): void {
  if (!databaseNamePattern.test(name)) {
    throw new SetupError(`database name "${name}" must match ${databaseNamePattern} (lower-case letters, digits, _; at most 63)`);
  }
}

/** The same server and credentials as `serverUrl`, pointing at database `name`. */
export function databaseUrlFor(serverUrl: string, name: string): string {
  assertDatabaseName(name);
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

async function withClient<T>(url: string, work: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: url });
  client.on('error', () => {});
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end().catch(() => {});
  }
}

/** Creates database `name` unless it exists. Returns true when it was created now. */
export async function createDatabaseIfMissing(adminUrl: string, name: string): Promise<boolean> {
  assertDatabaseName(name);
  return withClient(adminUrl, async (client) => {
    const existing = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (existing.rowCount) return false;
    try {
      await client.query(`create database "${name}" encoding 'UTF8' template template0`);
      return true;
    } catch (error) {
      if ((error as { code?: string }).code === '42P04') return false; // created meanwhile by someone else
      throw error;
    }
  });
}

/** Drops database `name`, closing any connections still open to it. */
export async function dropDatabase(adminUrl: string, name: string): Promise<void> {
  assertDatabaseName(name);
  await withClient(adminUrl, (client) => client.query(`drop database if exists "${name}" with (force)`));
}

/** Names of databases whose name starts with `prefix`. */
export async function listDatabases(adminUrl: string, prefix: string): Promise<string[]> {
  return withClient(adminUrl, async (client) => {
    const result = await client.query<{ datname: string }>(
      "select datname from pg_database where starts_with(datname, $1) order by datname",
      [prefix],
    );
    return result.rows.map((row) => row.datname);
  });
}

/**
 * Applies the committed Drizzle migrations in ./drizzle to the database at `url`.
 * An advisory lock makes concurrent callers wait for each other instead of racing.
 */
export async function migrateDatabase(url: string): Promise<void> {
  await withClient(url, async (client) => {
    await client.query('select pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
    try {
      await migrate(drizzle(client), { migrationsFolder: join(projectRoot, 'drizzle') });
    } finally {
      await client.query('select pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY]).catch(() => {});
    }
  });
}
