import type { Database } from '../../db/client';
import type { Env } from '../../env';
import { InvalidCredentialsError, InvalidTokenError, TooManyRequestsError } from '../../errors';
import { enqueueMail } from '../../mail/enqueue-mail';
import { hashPassword, spendPasswordCheckTime, verifyPassword } from '../../auth/passwords';
import { createToken, hashToken, PASSWORD_RESET_TTL_MS } from '../../auth/tokens';
import { loadSessionUser } from '../../auth/current-user';
import { isSessionExpired, sessionExpiresAt, type SessionData } from '../../auth/session';
import type { Me } from '../../../shared/schemas/auth';
import { recordAuditEvent } from '../audit/record-audit-event';
import {
  claimPasswordResetToken,
  clearFailedSignIns,
  findUserByEmail,
  insertEndedSession,
  insertPasswordResetToken,
  markPasswordResetTokensUsed,
  recordFailedSignIn,
  setPassword,
} from './auth.repository';
import { passwordResetMail } from './password-reset-mail';

/**
 * Per-account back-off: from the 5th consecutive failure the account is locked for
 * 1 min, then 2, 4, 8 … minutes per further failure, at most 1 hour. A success resets it.
 */
export const SIGN_IN_BACK_OFF = { threshold: 5, baseLockSeconds: 60, maxLockSeconds: 3600 } as const;

export interface RequestMeta {
  requestId: string;
}

/**
 * Check an e-mail and password. Unknown e-mail, wrong password and inactive account all
 * throw the same InvalidCredentialsError after the same bcrypt work; a locked account throws
 * TooManyRequestsError with the seconds to wait.
 */
export async function signIn(
  db: Database,
  env: Pick<Env, 'BCRYPT_COST'>,
  input: { email: string; password: string },
  meta: RequestMeta,
  now = new Date(),
): Promise<Me> {
  const user = await findUserByEmail(db, input.email);
  if (!user) {
    await spendPasswordCheckTime(input.password, env.BCRYPT_COST);
    throw new InvalidCredentialsError();
  }
  if (user.lockedUntil && user.lockedUntil > now) {
    throw new TooManyRequestsError((user.lockedUntil.getTime() - now.getTime()) / 1000);
  }
  const passwordMatches = user.passwordHash
    ? await verifyPassword(input.password, user.passwordHash)
    : await spendPasswordCheckTime(input.password, env.BCRYPT_COST);
  if (!passwordMatches) {
    const { failedSignIns, lockedUntil } = await recordFailedSignIn(db, user.id, SIGN_IN_BACK_OFF);
    if (failedSignIns === SIGN_IN_BACK_OFF.threshold) {
      await recordAuditEvent(db, {
        actor: null,
        action: 'user.locked_after_failed_sign_ins',
        entityType: 'user',
        entityId: user.id,
        after: { failedSignIns, lockedUntil: lockedUntil?.toISOString() ?? null },
        requestId: meta.requestId,
      });
    }
    throw new InvalidCredentialsError();
  }
  if (!user.active) throw new InvalidCredentialsError();

  if (user.failedSignIns > 0 || user.lockedUntil) await clearFailedSignIns(db, user.id);
  await recordAuditEvent(db, {
    actor: { id: user.id, email: user.email },
    action: 'user.signed_in',
    entityType: 'user',
    entityId: user.id,
    requestId: meta.requestId,
  });
  return { id: user.id, email: user.email, displayName: user.displayName, role: user.role };
}

/**
 * Start a password reset. Always succeeds from the caller's point of view; only a real,
 * active account gets a token and a mail (in one transaction), so the answer never tells
 * whether an e-mail address has an account.
 */
export async function requestPasswordReset(
  db: Database,
  env: Pick<Env, 'PUBLIC_URL'>,
  email: string,
  meta: RequestMeta,
  now = new Date(),
): Promise<void> {
  const user = await findUserByEmail(db, email);
  if (!user || !user.active) return;
  const { token, tokenHash } = createToken();
  const expiresAt = new Date(now.getTime() + PASSWORD_RESET_TTL_MS);
  const link = `${env.PUBLIC_URL}/reset-password?token=${encodeURIComponent(token)}`;
  await db.transaction(async (tx) => {
    await insertPasswordResetToken(tx, { userId: user.id, tokenHash, expiresAt });
    await enqueueMail(tx, passwordResetMail({ to: user.email, displayName: user.displayName, link }));
    await recordAuditEvent(tx, {
      actor: null,
      action: 'user.password_reset_requested',
      entityType: 'user',
      entityId: user.id,
      after: { expiresAt: expiresAt.toISOString() },
      requestId: meta.requestId,
    });
  });
}

/**
 * Finish a password reset: the token must be unused, unexpired and belong to an active user.
 * Sets the password, clears any lock, uses up every open reset token of the user and
 * ends all of their existing sessions.
 */
export async function confirmPasswordReset(
  db: Database,
  env: Pick<Env, 'BCRYPT_COST'>,
  input: { token: string; password: string },
  meta: RequestMeta,
): Promise<void> {
  const passwordHash = await hashPassword(input.password, env.BCRYPT_COST);
  await db.transaction(async (tx) => {
    const claimed = await claimPasswordResetToken(tx, hashToken(input.token));
    if (!claimed) throw new InvalidTokenError();
    await setPassword(tx, claimed.userId, passwordHash, new Date());
    await markPasswordResetTokensUsed(tx, claimed.userId);
    await recordAuditEvent(tx, {
      actor: { id: claimed.userId, email: claimed.email },
      action: 'user.password_reset',
      entityType: 'user',
      entityId: claimed.userId,
      requestId: meta.requestId,
    });
  });
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Sign-out, server side: remember this session's id until the cookie would expire anyway, so a
 * copy of the cookie taken before sign-out is refused, and record 'user.signed_out' in the same
 * transaction. Nothing to do for a session with no user or one that has already expired. The event
 * is written only when a signed-in user ends a live session: not for a session already ended, revoked
 * or of an inactive user. A session sealed before ids were given has nothing to remember, but its
 * sign-out is still recorded.
 */
export async function endSession(
  db: Database,
  env: Pick<Env, 'SESSION_TTL_SECONDS'>,
  session: SessionData,
  meta: RequestMeta,
  now = Date.now(),
): Promise<void> {
  const { sessionId, userId, issuedAt } = session;
  if (!userId || !UUID.test(userId) || typeof issuedAt !== 'number') return;
  if (sessionId !== undefined && !UUID.test(sessionId)) return;
  if (isSessionExpired(session, env.SESSION_TTL_SECONDS, now)) return;
  const expiresAt = sessionExpiresAt(session, env.SESSION_TTL_SECONDS);
  if (!expiresAt) return;
  await db.transaction(async (tx) => {
    // Read before the insert below, which would make this session count as ended.
    const user = await loadSessionUser(tx, userId, issuedAt, sessionId);
    const endedNow = sessionId ? await insertEndedSession(tx, { sessionId, userId, expiresAt }) : true;
    if (!user || !endedNow) return;
    await recordAuditEvent(tx, {
      actor: { id: user.id, email: user.email },
      action: 'user.signed_out',
      entityType: 'user',
      entityId: user.id,
      requestId: meta.requestId,
    });
  });
}
