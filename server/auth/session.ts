import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { getIronSession, type IronSession, type SessionOptions } from 'iron-session';
import type { Env } from '../env';

export const SESSION_COOKIE_NAME = 'quietlayer_session';

/** What the sealed cookie holds. Nothing else: the user is reloaded from the database on every request. */
export interface SessionData {
  userId?: string;
  /** Milliseconds since the epoch when this session was created at sign-in. */
  issuedAt?: number;
  /**
   * Random id (UUID) given at sign-in, so that signing out can end this session on the server
   * (table ended_sessions). Cookies sealed before ids existed have none; they are accepted until
   * they expire, but signing out cannot end them early.
   */
  sessionId?: string;
}

export type Session = IronSession<SessionData>;

export function sessionOptions(env: Pick<Env, 'SESSION_SECRET' | 'SESSION_TTL_SECONDS' | 'COOKIE_SECURE'>): SessionOptions {
  return {
    cookieName: SESSION_COOKIE_NAME,
    password: env.SESSION_SECRET,
    ttl: env.SESSION_TTL_SECONDS,
    cookieOptions: { httpOnly: true, sameSite: 'lax', secure: env.COOKIE_SECURE, path: '/' },
  };
}

export function loadSession(req: IncomingMessage, res: ServerResponse, options: SessionOptions): Promise<Session> {
  return getIronSession<SessionData>(req, res, options);
}

/**
 * Server-side expiry, independent of the cookie's own Max-Age and the seal's ttl:
 * a session older than SESSION_TTL_SECONDS is refused even if a client keeps the cookie.
 */
export function isSessionExpired(session: SessionData, ttlSeconds: number, now = Date.now()): boolean {
  if (typeof session.issuedAt !== 'number' || !Number.isFinite(session.issuedAt)) return true;
  if (session.issuedAt > now + 60_000) return true; // from the future: not one we issued
  return now - session.issuedAt > ttlSeconds * 1000;
}

/** When the server stops accepting this session (issuedAt + ttl), or null without a usable issuedAt. */
export function sessionExpiresAt(session: SessionData, ttlSeconds: number): Date | null {
  if (typeof session.issuedAt !== 'number' || !Number.isFinite(session.issuedAt)) return null;
  return new Date(session.issuedAt + ttlSeconds * 1000);
}

/**
 * Start a brand-new session for `userId`: the old contents are dropped and a fresh seal
 * (new salt, new issuedAt, new random session id) is written, so a cookie planted before
 * sign-in is never promoted.
 */
export async function startFreshSession(session: Session, userId: string, now = Date.now()): Promise<void> {
  for (const key of Object.keys(session) as (keyof SessionData)[]) delete session[key];
  session.userId = userId;
  session.issuedAt = now;
  session.sessionId = randomUUID();
  await session.save();
}
