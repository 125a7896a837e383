import { index, pgTable, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from './users';

/**
 * Sessions ended by signing out. Sessions live in sealed cookies, so the server keeps no list of
 * open ones; instead it remembers the ids of those that were ended, and the per-request user lookup
 * refuses a cookie whose id is here. A row is useless once `expires_at` has passed (the cookie is
 * refused as expired anyway) and is deleted on a later sign-out.
 */
export const endedSessions = pgTable(
  'ended_sessions',
  {
    /** The random id sealed into the cookie at sign-in (server/auth/session.ts). */
    sessionId: uuid('session_id').primaryKey(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id),
    endedAt: timestamp('ended_at', { withTimezone: true }).notNull().defaultNow(),
    /** issuedAt + SESSION_TTL_SECONDS: after this the cookie is refused as expired. */
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
  },
  (table) => [index('ended_sessions_expires_at_idx').on(table.expiresAt)],
);
