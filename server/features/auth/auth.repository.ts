import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { endedSessions, passwordResetTokens, users } from '../../db/schema';

export type UserRow = typeof users.$inferSelect;

/** Case-insensitive lookup, matching the unique index on lower(email). */
export async function findUserByEmail(db: DbOrTx, email: string): Promise<UserRow | undefined> {
  const [row] = await db
    .select()
    .from(users)
    .where(sql`lower(${users.email}) = lower(${email})`)
    .limit(1);
  return row;
}

/**
 * Count one more failed sign-in, atomically. From the `threshold`-th consecutive failure on,
 * the account is locked for baseLockSeconds · 2^(failures − threshold), capped at maxLockSeconds.
 */
export async function recordFailedSignIn(
  db: DbOrTx,
  userId: string,
  backOff: { threshold: number; baseLockSeconds: number; maxLockSeconds: number },
): Promise<{ failedSignIns: number; lockedUntil: Date | null }> {
  const failures = sql`${users.failedSignIns} + 1`;
  const [row] = await db
    .update(users)
    .set({
      failedSignIns: sql`${failures}`,
      lockedUntil: sql`case when ${failures} >= ${backOff.threshold}
        then now() + make_interval(secs => least(${backOff.maxLockSeconds}::float8,
                                                 ${backOff.baseLockSeconds}::float8 * power(2, ${failures} - ${backOff.threshold})))
        else ${users.lockedUntil} end`,
    })
    .where(eq(users.id, userId))
    .returning({ failedSignIns: users.failedSignIns, lockedUntil: users.lockedUntil });
  return row;
}

export async function clearFailedSignIns(db: DbOrTx, userId: string): Promise<void> {
  await db.update(users).set({ failedSignIns: 0, lockedUntil: null }).where(eq(users.id, userId));
}

export async function insertPasswordResetToken(db: DbOrTx, values: { userId: string; tokenHash: string; expiresAt: Date }): Promise<void> {
  await db.insert(passwordResetTokens).values(values);
}

/** Locks and returns an unused, unexpired reset token with its (active) user, or undefined. */
export async function claimPasswordResetToken(db: DbOrTx, tokenHash: string) {
  const [row] = await db
    .select({ tokenId: passwordResetTokens.id, userId: users.id, email: users.email })
    .from(passwordResetTokens)
    .innerJoin(users, eq(users.id, passwordResetTokens.userId))
    .where(
      and(
        eq(passwordResetTokens.tokenHash, tokenHash),
        isNull(passwordResetTokens.usedAt),
        gt(passwordResetTokens.expiresAt, sql`now()`),
        eq(users.active, true),
      ),
    )
    .limit(1)
    .for('update', { of: passwordResetTokens });
  return row;
}

/** Marks this token and every other open reset token of the user as used. */
export async function markPasswordResetTokensUsed(db: DbOrTx, userId: string): Promise<void> {
  await db
    .update(passwordResetTokens)
    .set({ usedAt: sql`now()` })
    .where(and(eq(passwordResetTokens.userId, userId), isNull(passwordResetTokens.usedAt)));
}

export async function setPassword(db: DbOrTx, userId: string, passwordHash: string, sessionsValidAfter: Date): Promise<void> {
  await db
    .update(users)
    .set({ passwordHash, failedSignIns: 0, lockedUntil: null, sessionsValidAfter, updatedAt: sql`now()` })
    .where(eq(users.id, userId));
}

/**
 * Records a signed-out session so its cookie is refused from now on (server/auth/current-user.ts),
 * and in the same statement deletes rows whose cookies have expired anyway. Inserting through a
 * select on users keeps a session of a since-removed user from failing on the foreign key.
 * True when this call ended the session (false: already ended, or no such user).
 */
export async function insertEndedSession(db: DbOrTx, values: { sessionId: string; userId: string; expiresAt: Date }): Promise<boolean> {
  const { rows } = await db.execute(sql`
    with pruned as (delete from ${endedSessions} where ${endedSessions.expiresAt} < now())
    insert into ${endedSessions} (session_id, user_id, expires_at)
    select ${values.sessionId}::uuid, ${users.id}, ${values.expiresAt.toISOString()}::timestamptz
      from ${users} where ${users.id} = ${values.userId}::uuid
    on conflict (session_id) do nothing
    returning session_id`);
  return rows.length > 0;
}
