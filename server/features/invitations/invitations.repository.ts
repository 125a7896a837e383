import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { invitations, users } from '../../db/schema';
import type { Role } from '../../../shared/schemas/roles';

const openInvitation = (tokenHash: string) =>
  and(eq(invitations.tokenHash, tokenHash), isNull(invitations.usedAt), gt(invitations.expiresAt, sql`now()`));

export async function findOpenInvitation(db: DbOrTx, tokenHash: string) {
  const [row] = await db.select().from(invitations).where(openInvitation(tokenHash)).limit(1);
  return row;
}

/** Locks an unused, unexpired invitation so two acceptances cannot both succeed. */
export async function claimOpenInvitation(db: DbOrTx, tokenHash: string) {
  const [row] = await db.select().from(invitations).where(openInvitation(tokenHash)).limit(1).for('update');
  return row;
}

export async function markInvitationUsed(db: DbOrTx, id: string): Promise<void> {
  await db.update(invitations).set({ usedAt: sql`now()` }).where(eq(invitations.id, id));
}

export async function insertUser(
  db: DbOrTx,
  values: { email: string; displayName: string; role: Role; passwordHash: string },
) {
  const [row] = await db.insert(users).values(values).returning();
  return row;
}
