import { desc, eq } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { dryingSetups } from '../../db/schema/beyond-onset';
import { users } from '../../db/schema/users';

export type DryingSetupRow = typeof dryingSetups.$inferSelect;

export async function insertDryingSetup(db: DbOrTx, values: typeof dryingSetups.$inferInsert): Promise<DryingSetupRow> {
  const [row] = await db.insert(dryingSetups).values(values).returning();
  return row;
}

const withName = { setup: dryingSetups, createdByName: users.displayName };

export async function findDryingSetupsOfCheck(db: DbOrTx, checkId: string) {
  return db
    .select(withName)
    .from(dryingSetups)
    .leftJoin(users, eq(users.id, dryingSetups.createdBy))
    .where(eq(dryingSetups.checkId, checkId))
    .orderBy(desc(dryingSetups.createdAt))
    .limit(200);
}

export async function findDryingSetupById(db: DbOrTx, id: string) {
  const [row] = await db.select(withName).from(dryingSetups).leftJoin(users, eq(users.id, dryingSetups.createdBy)).where(eq(dryingSetups.id, id)).limit(1);
  return row;
}
