import { sql } from 'drizzle-orm';
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import type { Database } from '../db/client';

/** Every this many increments a store also deletes rows whose window ended over an hour ago. */
export const PRUNE_EVERY_INCREMENTS = 100;

interface CountRow extends Record<string, unknown> {
  hits: number | string;
  reset_ms: number | string;
}

function toInfo(row: CountRow): ClientRateLimitInfo {
  return { totalHits: Number(row.hits), resetTime: new Date(Number(row.reset_ms)) };
}

/**
 * express-rate-limit store on the `rate_limit_hits` table, so every server process on one database
 * counts against the same budget per client address. Each hit is one atomic upsert: concurrent hits
 * from several processes are serialised on the row by PostgreSQL, and a row whose window has passed
 * starts again at 1 with a fresh window. Times come from the database clock, the same for every process.
 *
 * Expired rows are deleted inside the increment statement on every PRUNE_EVERY_INCREMENTS-th hit of a
 * store (no timer, so nothing keeps the process alive). The table holds one row per limiter and address
 * seen in the last window plus an hour, so that delete scans a small table.
 */
export class PostgresRateLimitStore implements Store {
  /** Hits counted here are seen by every other process on the same database. */
  readonly localKeys = false;
  readonly prefix: string;
  private windowMs: number;
  private increments = 0;

  /** `prefix` keeps limiters apart (sign-in and token use must not share counts). */
  constructor(
    private readonly db: Database,
    options: { prefix: string; windowMs?: number },
  ) {
    this.prefix = options.prefix;
    this.windowMs = options.windowMs ?? 60_000;
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private key(key: string): string {
    return `${this.prefix}${key}`;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const { rows } = await this.db.execute<CountRow>(sql`
      select hits, extract(epoch from reset_at) * 1000 as reset_ms
        from rate_limit_hits
       where key = ${this.key(key)} and reset_at > now()`);
    return rows[0] ? toInfo(rows[0]) : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const fullKey = this.key(key);
    const prune = this.increments++ % PRUNE_EVERY_INCREMENTS === 0;
    // The update's SET expressions all read the row as it was, so both CASEs test the old reset_at.
    const upsert = sql`
      insert into rate_limit_hits as r (key, hits, reset_at)
      values (${fullKey}, 1, now() + ${this.windowMs}::float8 * interval '1 millisecond')
      on conflict (key) do update set
        hits = case when r.reset_at <= now() then 1 else r.hits + 1 end,
        reset_at = case when r.reset_at <= now() then excluded.reset_at else r.reset_at end
      returning hits, extract(epoch from reset_at) * 1000 as reset_ms`;
    // The prune leaves this key alone: one statement must not both delete and upsert the same row.
    const statement = prune
      ? sql`with pruned as (delete from rate_limit_hits where reset_at < now() - interval '1 hour' and key <> ${fullKey}) ${upsert}`
      : upsert;
    const { rows } = await this.db.execute<CountRow>(statement);
    return toInfo(rows[0]);
  }

  async decrement(key: string): Promise<void> {
    await this.db.execute(sql`
      update rate_limit_hits set hits = greatest(hits - 1, 0)
       where key = ${this.key(key)} and reset_at > now()`);
  }

  async resetKey(key: string): Promise<void> {
    await this.db.execute(sql`delete from rate_limit_hits where key = ${this.key(key)}`);
  }

  async resetAll(): Promise<void> {
    await this.db.execute(sql`delete from rate_limit_hits where starts_with(key, ${this.prefix})`);
  }
}
