import { and, asc, count, desc, eq, ilike, sql, type SQL } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { escapeLike } from '../../db/escape-like';
import { fluids } from '../../db/schema/fluids';
import { layerChecks } from '../../db/schema/layer-checks';
import type { FluidListQuery } from '../../../shared/schemas/fluids';
import type { z } from 'zod';
import type { fluidListQuerySchema } from '../../../shared/schemas/fluids';

export type FluidRow = typeof fluids.$inferSelect;
export type NewFluidRow = typeof fluids.$inferInsert;
type ParsedListQuery = z.output<typeof fluidListQuerySchema>;
export type { FluidListQuery };

const sortColumns = {
  name: sql`lower(${fluids.name})`,
  kind: fluids.kind,
  updatedAt: fluids.updatedAt,
  density: fluids.density,
  viscosity: fluids.viscosityAtReference,
  surfaceTension: fluids.surfaceTension,
} as const;

export async function findFluidPage(db: DbOrTx, query: ParsedListQuery): Promise<{ rows: FluidRow[]; total: number }> {
  const conditions: SQL[] = [];
  if (!query.includeArchived) conditions.push(eq(fluids.archived, false));
  if (query.kind) conditions.push(eq(fluids.kind, query.kind));
  if (query.q) conditions.push(ilike(fluids.name, `%${escapeLike(query.q)}%`));
  const where = conditions.length > 0 ? and(...conditions) : undefined;
  const order = query.dir === 'desc' ? desc(sortColumns[query.sort]) : asc(sortColumns[query.sort]);
  const [rows, [{ total }]] = await Promise.all([
    db.select().from(fluids).where(where).orderBy(order, asc(fluids.id)).limit(query.pageSize).offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(fluids).where(where),
  ]);
  return { rows, total };
}

export async function findFluidById(db: DbOrTx, id: string): Promise<FluidRow | undefined> {
  const [row] = await db.select().from(fluids).where(eq(fluids.id, id)).limit(1);
  return row;
}

export async function findFluidForUpdate(db: DbOrTx, id: string): Promise<FluidRow | undefined> {
  const [row] = await db.select().from(fluids).where(eq(fluids.id, id)).limit(1).for('update');
  return row;
}

export async function countChecksUsingFluid(db: DbOrTx, id: string): Promise<number> {
  const [{ n }] = await db.select({ n: count() }).from(layerChecks).where(eq(layerChecks.fluidId, id));
  return n;
}

export async function insertFluids(db: DbOrTx, rows: NewFluidRow[]): Promise<FluidRow[]> {
  if (rows.length === 0) return [];
  return db.insert(fluids).values(rows).returning();
}

/** Updates when the version still matches; returns undefined when it does not (stale). */
export async function updateFluidIfVersion(
  db: DbOrTx,
  id: string,
  version: number,
  values: Partial<NewFluidRow>,
): Promise<FluidRow | undefined> {
  const [row] = await db
    .update(fluids)
    .set({ ...values, version: sql`${fluids.version} + 1`, updatedAt: sql`now()` })
    .where(and(eq(fluids.id, id), eq(fluids.version, version)))
    .returning();
  return row;
}

export async function findAllFluids(db: DbOrTx, options: { includeArchived: boolean }): Promise<FluidRow[]> {
  return db
    .select()
    .from(fluids)
    .where(options.includeArchived ? undefined : eq(fluids.archived, false))
    .orderBy(asc(sql`lower(${fluids.name})`), asc(fluids.id));
}
