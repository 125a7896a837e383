import { and, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { endedSessions, users } from '../db/schema';
import type { Me } from '../../shared/schemas/auth';

/** The signed-in person for this request, reloaded from the database every time. */
export type CurrentUser = Me;

function buildSessionUserQuery(db: DbOrTx) {
  return db
    .select({
      id: users.id,
      email: users.email,
      displayName: users.displayName,
      role: users.role,
      active: users.active,
      sessionsValidAfter: users.sessionsValidAfter,
      sessionEnded: sql<boolean>`${endedSessions.sessionId} is not null`,
    })
    .from(users)
    // Same round trip: a null sessionId (a cookie from before session ids) matches no row.
    .leftJoin(endedSessions, and(eq(endedSessions.sessionId, sql.placeholder('sessionId')), eq(endedSessions.userId, users.id)))
    .where(eq(users.id, sql.placeholder('userId')))
    .limit(1)
    .prepare('quietlayer_session_user');
}

/**
 * The session lookup runs on every signed-in request: it is built once per database handle and
 * sent as a named prepared statement, so neither the query builder nor PostgreSQL's parser and
 * planner repeat the work for each request.
 */
const sessionUserQueries = new WeakMap<DbOrTx, ReturnType<typeof buildSessionUserQuery>>();

function sessionUserQuery(db: DbOrTx) {
  let query = sessionUserQueries.get(db);
  if (query === undefined) {
    query = buildSessionUserQuery(db);
    sessionUserQueries.set(db, query);
  }
  return query;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Loads the user a session belongs to. Null (which ends the session) when the user is
 * missing or inactive, when the session was issued before their sessions were revoked
 * (a password reset revokes every earlier session), or when this session was signed out
 * (its id is in ended_sessions). A session without an id (sealed before ids were given)
 * is treated as not ended.
 */
export async function loadSessionUser(
  db: DbOrTx,
  userId: string,
  issuedAt: number,
  sessionId?: string,
): Promise<CurrentUser | null> {
  if (!UUID.test(userId)) return null;
  if (sessionId !== undefined && !UUID.test(sessionId)) return null;
  const [row] = await sessionUserQuery(db).execute({ userId, sessionId: sessionId ?? null });
  if (!row || !row.active || row.sessionEnded) return null;
  if (row.sessionsValidAfter && issuedAt < row.sessionsValidAfter.getTime()) return null;
  return { id: row.id, email: row.email, displayName: row.displayName, role: row.role };
}
