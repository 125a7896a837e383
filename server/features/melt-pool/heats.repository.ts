import { and, asc, count, eq, ilike, or, sql } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { escapeLike } from '../../db/escape-like';
import { heats } from '../../db/schema/beyond-onset';

export type HeatRow = typeof heats.$inferSelect;

export async function findHeatPage(db: DbOrTx, query: { q?: string; page: number; pageSize: number }) {
  const where = query.q
    ? or(ilike(heats.heatNumber, `%${escapeLike(query.q)}%`), ilike(heats.supplier, `%${escapeLike(query.q)}%`))
    : undefined;
  const [rows, [{ total }]] = await Promise.all([
    db
      .select()
      .from(heats)
      .where(where)
      .orderBy(sql`lower(${heats.heatNumber})`, asc(heats.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(heats).where(where),
  ]);
  return { rows, total };
}

export async function findHeatById(db: DbOrTx, id: string): Promise<HeatRow | undefined> {
  const [row] = await db.select().from(heats).where(eq(heats.id, id)).limit(1);
  return row;
}

export async function findHeatByNumber(db: DbOrTx, heatNumber: string): Promise<HeatRow | undefined> {
  const [row] = await db.select().from(heats).where(sql`lower(${heats.heatNumber}) = lower(${heatNumber})`).limit(1);
  return row;
}

export async function insertHeat(db: DbOrTx, values: typeof heats.$inferInsert): Promise<HeatRow | undefined> {
  const [row] = await db.insert(heats).values(values).onConflictDoNothing().returning();
  return row;
}

export async function updateHeatIfVersion(db: DbOrTx, id: string, version: number, values: Partial<typeof heats.$inferInsert>): Promise<HeatRow | undefined> {
  const [row] = await db
    .update(heats)
    .set({ ...values, version: version + 1, updatedAt: sql`now()` })
    .where(and(eq(heats.id, id), eq(heats.version, version)))
    .returning();
  return row;
}

export async function deleteHeat(db: DbOrTx, id: string): Promise<HeatRow | undefined> {
  const [row] = await db.delete(heats).where(eq(heats.id, id)).returning();
  return row;
}
