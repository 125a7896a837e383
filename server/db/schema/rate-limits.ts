import { integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/**
 * Per-address request counts of the rate limiters (server/http/postgres-rate-limit-store.ts),
 * kept in the database so every server process counts against one budget. One row per limiter
 * and client address (`key` starts with the limiter's prefix); a row whose `reset_at` has passed
 * starts again at 1 on its next hit, and the store deletes rows an hour past it now and then.
 */
export const rateLimitHits = pgTable('rate_limit_hits', {
  key: text('key').primaryKey(),
  hits: integer('hits').notNull(),
  resetAt: timestamp('reset_at', { withTimezone: true }).notNull(),
});
