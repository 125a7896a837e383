import { and, asc, count, desc, eq, ilike, sql, type SQL } from 'drizzle-orm';
import type { z } from 'zod';
import type { layerCheckListQuerySchema } from '../../../shared/schemas/layer-checks';
import type { DbOrTx } from '../../db/client';
import { escapeLike } from '../../db/escape-like';
import { fluids } from '../../db/schema/fluids';
import { checkRevisions, layerChecks } from '../../db/schema/layer-checks';
import { users } from '../../db/schema/users';

export type LayerCheckRow = typeof layerChecks.$inferSelect;
export type NewLayerCheckRow = typeof layerChecks.$inferInsert;
export interface LayerCheckWithNames {
  check: LayerCheckRow;
  fluidName: string;
  fluidArchived: boolean;
  ownerName: string | null;
}

const sortColumns = {
  title: sql`lower(${layerChecks.title})`,
  processKind: layerChecks.processKind,
  updatedAt: layerChecks.updatedAt,
  depth: layerChecks.depthSi,
  margin: layerChecks.savedMargin,
} as const;

/** One page of checks with the fluid and owner names (columns for the table only). */
export async function findCheckPage(db: DbOrTx, query: z.output<typeof layerCheckListQuerySchema>) {
  const conditions: SQL[] = [];
  if (query.processKind) conditions.push(eq(layerChecks.processKind, query.processKind));
  if (query.fluidId) conditions.push(eq(layerChecks.fluidId, query.fluidId));
  if (query.ownerId) conditions.push(eq(layerChecks.ownerId, query.ownerId));
  if (query.q) conditions.push(ilike(layerChecks.title, `%${escapeLike(query.q)}%`));
  const where = conditions.length > 0 ? and(...conditions) : undefined;
  const column = sortColumns[query.sort];
  // No margin (no onset possible) sorts as the largest margin.
  const order = query.dir === 'desc' ? sql`${column} desc nulls first` : sql`${column} asc nulls last`;
  const [rows, [{ total }]] = await Promise.all([
    db
      .select({
        id: layerChecks.id,
        title: layerChecks.title,
        processKind: layerChecks.processKind,
        fluidId: layerChecks.fluidId,
        fluidName: fluids.name,
        depth: layerChecks.depthText,
        depthSi: layerChecks.depthSi,
        ownerName: users.displayName,
        revision: layerChecks.revision,
        savedMargin: layerChecks.savedMargin,
        savedRegime: layerChecks.savedRegime,
        updatedAt: layerChecks.updatedAt,
      })
      .from(layerChecks)
      .innerJoin(fluids, eq(fluids.id, layerChecks.fluidId))
      .leftJoin(users, eq(users.id, layerChecks.ownerId))
      .where(where)
      .orderBy(order, asc(layerChecks.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(layerChecks).where(where),
  ]);
  return { rows, total };
}

export async function findCheckById(db: DbOrTx, id: string, options: { forUpdate?: boolean } = {}): Promise<LayerCheckWithNames | undefined> {
  const base = db
    .select({ check: layerChecks, fluidName: fluids.name, fluidArchived: fluids.archived, ownerName: users.displayName })
    .from(layerChecks)
    .innerJoin(fluids, eq(fluids.id, layerChecks.fluidId))
    .leftJoin(users, eq(users.id, layerChecks.ownerId))
    .where(eq(layerChecks.id, id))
    .limit(1);
  const [row] = options.forUpdate ? await base.for('update', { of: layerChecks }) : await base;
  return row;
}

export async function insertCheck(db: DbOrTx, values: NewLayerCheckRow): Promise<LayerCheckRow> {
  const [row] = await db.insert(layerChecks).values(values).returning();
  return row;
}

export async function updateCheckIfVersion(db: DbOrTx, id: string, version: number, values: Partial<NewLayerCheckRow>): Promise<LayerCheckRow | undefined> {
  const [row] = await db
    .update(layerChecks)
    .set({ ...values, version: sql`${layerChecks.version} + 1`, updatedAt: sql`now()` })
    .where(and(eq(layerChecks.id, id), eq(layerChecks.version, version)))
    .returning();
  return row;
}

export async function insertRevision(db: DbOrTx, values: typeof checkRevisions.$inferInsert): Promise<void> {
  await db.insert(checkRevisions).values(values);
}

export async function findRevisions(db: DbOrTx, checkId: string) {
  return db
    .select({
      revision: checkRevisions.revision,
      savedAt: checkRevisions.savedAt,
      savedById: checkRevisions.savedBy,
      savedByName: users.displayName,
      input: checkRevisions.input,
    })
    .from(checkRevisions)
    .leftJoin(users, eq(users.id, checkRevisions.savedBy))
    .where(eq(checkRevisions.checkId, checkId))
    .orderBy(desc(checkRevisions.revision));
}

/** The one lookup evaluate needs: the fluid's laws and whether it is archived. */
function buildFluidLawsQuery(db: DbOrTx) {
  return db
    .select({ laws: fluids.laws, archived: fluids.archived, name: fluids.name })
    .from(fluids)
    .where(eq(fluids.id, sql.placeholder('id')))
    .limit(1)
    .prepare('quietlayer_fluid_laws');
}

/** Built once per database handle: the evaluate endpoint looks a fluid up on every request. */
const fluidLawsQueries = new WeakMap<DbOrTx, ReturnType<typeof buildFluidLawsQuery>>();

export async function findFluidLaws(db: DbOrTx, id: string) {
  let query = fluidLawsQueries.get(db);
  if (query === undefined) {
    query = buildFluidLawsQuery(db);
    fluidLawsQueries.set(db, query);
  }
  const [row] = await query.execute({ id });
  return row;
}
