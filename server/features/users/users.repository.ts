import { and, asc, count, eq, ilike, or, sql, type SQL } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { escapeLike } from '../../db/escape-like';
import { invitations, users } from '../../db/schema';
import type { User } from '../../../shared/schemas/users';
import type { Role } from '../../../shared/schemas/roles';

type UserRow = typeof users.$inferSelect;

export function toUser(row: UserRow): User {
  return {
    id: row.id,
    email: row.email,
    displayName: row.displayName,
    role: row.role,
    active: row.active,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export async function listUsers(
  db: DbOrTx,
  query: { q?: string; page: number; pageSize: number },
): Promise<{ items: User[]; total: number }> {
  const conditions: SQL[] = [];
  if (query.q) {
    const pattern = `%${escapeLike(query.q)}%`;
    conditions.push(or(ilike(users.email, pattern), ilike(users.displayName, pattern)) as SQL);
  }
  const where = conditions.length > 0 ? and(...conditions) : undefined;
  const [rows, [{ total }]] = await Promise.all([
    db
      .select()
      .from(users)
      .where(where)
      .orderBy(asc(sql`lower(${users.email})`))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(users).where(where),
  ]);
  return { items: rows.map(toUser), total };
}

export async function emailHasAccount(db: DbOrTx, email: string): Promise<boolean> {
  const [row] = await db
    .select({ id: users.id })
    .from(users)
    .where(sql`lower(${users.email}) = lower(${email})`)
    .limit(1);
  return row !== undefined;
}

export async function findUserByIdForUpdate(db: DbOrTx, id: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1).for('update');
  return row;
}

/**
 * Locks every active administrator row and returns how many there are. Taking these locks
 * first means two administrators demoting each other at the same moment cannot both pass
 * the "at least one administrator" rule.
 */
export async function lockActiveAdministrators(db: DbOrTx): Promise<number> {
  const rows = await db
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.role, 'administrator'), eq(users.active, true)))
    .orderBy(asc(users.id))
    .for('update');
  return rows.length;
}

export async function updateUserRow(db: DbOrTx, id: string, changes: { role?: Role; active?: boolean }): Promise<UserRow> {
  const [row] = await db
    .update(users)
    .set({ ...changes, updatedAt: sql`now()` })
    .where(eq(users.id, id))
    .returning();
  return row;
}

export async function insertInvitation(
  db: DbOrTx,
  values: { email: string; displayName: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date },
) {
  const [row] = await db.insert(invitations).values(values).returning();
  return row;
}
