import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { fluids } from '../../db/schema/fluids';
import { propertySpreadChunks, propertySpreads } from '../../db/schema/beyond-onset';

export type PropertySpreadRow = typeof propertySpreads.$inferSelect;

export async function insertSpread(db: DbOrTx, values: typeof propertySpreads.$inferInsert): Promise<PropertySpreadRow> {
  const [row] = await db.insert(propertySpreads).values(values).returning();
  return row;
}

export async function findSpreadById(db: DbOrTx, id: string): Promise<PropertySpreadRow | undefined> {
  const [row] = await db.select().from(propertySpreads).where(eq(propertySpreads.id, id)).limit(1);
  return row;
}

export async function findSpreadsOfCheck(db: DbOrTx, checkId: string): Promise<PropertySpreadRow[]> {
  return db.select().from(propertySpreads).where(eq(propertySpreads.checkId, checkId)).orderBy(desc(propertySpreads.createdAt)).limit(100);
}

/** Spreads a worker still has to finish (queued or interrupted while running). */
export async function findUnfinishedSpreadIds(db: DbOrTx): Promise<string[]> {
  const rows = await db.select({ id: propertySpreads.id }).from(propertySpreads).where(inArray(propertySpreads.status, ['queued', 'running']));
  return rows.map((r) => r.id);
}

export async function updateSpread(db: DbOrTx, id: string, values: Partial<typeof propertySpreads.$inferInsert>): Promise<void> {
  await db
    .update(propertySpreads)
    .set({ ...values, updatedAt: sql`now()` })
    .where(eq(propertySpreads.id, id));
}

/** Sample ranges already stored for a spread, in order. */
export async function findChunkRanges(db: DbOrTx, spreadId: string): Promise<{ start: number; end: number }[]> {
  return db
    .select({ start: propertySpreadChunks.start, end: propertySpreadChunks.end })
    .from(propertySpreadChunks)
    .where(eq(propertySpreadChunks.spreadId, spreadId))
    .orderBy(asc(propertySpreadChunks.start));
}

export async function findChunks(db: DbOrTx, spreadId: string): Promise<unknown[]> {
  const rows = await db
    .select({ chunk: propertySpreadChunks.chunk })
    .from(propertySpreadChunks)
    .where(eq(propertySpreadChunks.spreadId, spreadId))
    .orderBy(asc(propertySpreadChunks.start));
  return rows.map((r) => r.chunk);
}

/** Stores one chunk; a chunk already stored (a second worker on the same range) is left as it is. */
export async function insertChunk(db: DbOrTx, spreadId: string, start: number, end: number, chunk: unknown): Promise<boolean> {
  const rows = await db.insert(propertySpreadChunks).values({ spreadId, start, end, chunk }).onConflictDoNothing().returning({ start: propertySpreadChunks.start });
  return rows.length > 0;
}

/** Raises the evaluated count to `evaluated` (never lowers it). */
export async function advanceProgress(db: DbOrTx, id: string, evaluated: number): Promise<void> {
  await db
    .update(propertySpreads)
    .set({ evaluatedSamples: sql`greatest(${propertySpreads.evaluatedSamples}, ${evaluated})`, status: 'running', updatedAt: sql`now()` })
    .where(and(eq(propertySpreads.id, id), inArray(propertySpreads.status, ['queued', 'running'])));
}

export async function findFluidForSpread(db: DbOrTx, fluidId: string) {
  const [row] = await db.select({ laws: fluids.laws, definition: fluids.definition, name: fluids.name }).from(fluids).where(eq(fluids.id, fluidId)).limit(1);
  return row;
}
