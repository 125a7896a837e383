import { and, count, eq, gte, inArray } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { auditEvents } from '../../db/schema/audit';
import { users } from '../../db/schema/users';

export async function findPasswordHash(db: DbOrTx, userId: string): Promise<string | null> {
  const [row] = await db.select({ hash: users.passwordHash }).from(users).where(eq(users.id, userId)).limit(1);
  return row?.hash ?? null;
}

/** How many failed signings (audit actions `failedActions`) this person made since `since`. */
export async function countSignFailuresSince(db: DbOrTx, userId: string, failedActions: readonly string[], since: Date): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(auditEvents)
    .where(and(eq(auditEvents.actorId, userId), inArray(auditEvents.action, [...failedActions]), gte(auditEvents.occurredAt, since)));
  return row.n;
}

export async function findActiveAdministrators(db: DbOrTx) {
  return db.select({ email: users.email }).from(users).where(and(eq(users.role, 'administrator'), eq(users.active, true)));
}
