import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import * as schema from './schema';

export type Database = NodePgDatabase<typeof schema>;
/** A database handle or an open transaction: repositories accept either. */
export type DbOrTx = Database | Parameters<Parameters<Database['transaction']>[0]>[0];

/**
 * One pg Pool per process. The short connection timeout makes a database that is down
 * fail a request within ~2 s (answered 503 by the error handler) instead of hanging.
 */
export function createDatabase(url: string, options: { max?: number } = {}): { db: Database; pool: Pool } {
  const pool = new Pool({
    connectionString: url,
    max: options.max ?? 10,
    connectionTimeoutMillis: 2_000,
    idleTimeoutMillis: 30_000,
  });
  // An idle client losing its connection must not crash the process; the next query reconnects.
  pool.on('error', () => {});
  const db = drizzle(pool, { schema });
  return { db, pool };
}

export { schema };
