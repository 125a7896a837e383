import { and, asc, count, desc, eq, ilike, inArray, isNull, or, sql, type SQL } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { escapeLike } from '../../db/escape-like';
import { gaugeBatches, gaugeNotes, gaugeReadings, gaugeTokens, layerChecks, processSheets, sheetRevisions, sheetSignatures, users } from '../../db/schema';
import type { SheetSnapshot } from '../../../shared/schemas/sheets';

export type RevisionRow = typeof sheetRevisions.$inferSelect;
export type BatchRow = typeof gaugeBatches.$inferSelect;
export type TokenRow = typeof gaugeTokens.$inferSelect;
export type NoteRow = typeof gaugeNotes.$inferSelect;

/** A sheet revision with what the gauge log shows beside it. */
export interface RevisionContext {
  revisionId: string;
  sheetId: string;
  number: string;
  revision: number;
  state: RevisionRow['state'];
  title: string;
  line: string;
  snapshot: SheetSnapshot;
  /** The check's owner, or the sheet revision's author when the check has none. */
  ownerId: string;
  ownerName: string;
  ownerEmail: string;
  signedAt: Date | null;
}

const owner = sql<string>`coalesce(${layerChecks.ownerId}, ${sheetRevisions.authorId})`;

export async function findRevisionContext(db: DbOrTx, revisionId: string): Promise<RevisionContext | undefined> {
  const [row] = await db
    .select({
      revisionId: sheetRevisions.id,
      sheetId: processSheets.id,
      number: processSheets.number,
      revision: sheetRevisions.revision,
      state: sheetRevisions.state,
      title: sheetRevisions.title,
      line: sheetRevisions.line,
      snapshot: sheetRevisions.snapshot,
      ownerId: users.id,
      ownerName: users.displayName,
      ownerEmail: users.email,
      signedAt: sheetSignatures.signedAt,
    })
    .from(sheetRevisions)
    .innerJoin(processSheets, eq(processSheets.id, sheetRevisions.sheetId))
    .innerJoin(layerChecks, eq(layerChecks.id, processSheets.checkId))
    .innerJoin(users, eq(users.id, owner))
    .leftJoin(sheetSignatures, eq(sheetSignatures.revisionId, sheetRevisions.id))
    .where(eq(sheetRevisions.id, revisionId))
    .limit(1);
  return row;
}

/** The signed (released) revision of a sheet, if any. */
export async function findSignedRevisionOfSheet(db: DbOrTx, sheetId: string): Promise<string | undefined> {
  const [row] = await db
    .select({ id: sheetRevisions.id })
    .from(sheetRevisions)
    .where(and(eq(sheetRevisions.sheetId, sheetId), eq(sheetRevisions.state, 'signed')))
    .orderBy(desc(sheetRevisions.revision))
    .limit(1);
  return row?.id;
}

/** Signed revisions with their reading counts, newest sheet first. */
export async function findReleasedPage(db: DbOrTx, query: { page: number; pageSize: number; line?: string; q?: string }) {
  const conditions: SQL[] = [eq(sheetRevisions.state, 'signed')];
  if (query.line) conditions.push(eq(sheetRevisions.line, query.line));
  if (query.q) {
    const pattern = `%${escapeLike(query.q)}%`;
    conditions.push(or(ilike(sheetRevisions.title, pattern), ilike(processSheets.number, pattern)) as SQL);
  }
  const where = and(...conditions);
  const stats = db
    .select({
      revisionId: gaugeBatches.revisionId,
      readingCount: sql<number>`sum(${gaugeBatches.readingCount})::int`.as('reading_count'),
      overCount: sql<number>`sum(${gaugeBatches.overCount})::int`.as('over_count'),
      lastAt: sql<Date>`max(${gaugeBatches.createdAt})`.as('last_at'),
    })
    .from(gaugeBatches)
    .groupBy(gaugeBatches.revisionId)
    .as('stats');
  const notes = db
    .select({ revisionId: gaugeNotes.revisionId, openNotes: sql<number>`count(*)::int`.as('open_notes') })
    .from(gaugeNotes)
    .where(sql`${gaugeNotes.state} <> 'closed'`)
    .groupBy(gaugeNotes.revisionId)
    .as('open_notes_by_revision');
  const [rows, [{ total }]] = await Promise.all([
    db
      .select({
        revisionId: sheetRevisions.id,
        sheetId: processSheets.id,
        number: processSheets.number,
        revision: sheetRevisions.revision,
        title: sheetRevisions.title,
        line: sheetRevisions.line,
        snapshot: sheetRevisions.snapshot,
        ownerName: users.displayName,
        signedAt: sheetSignatures.signedAt,
        readingCount: stats.readingCount,
        overCount: stats.overCount,
        lastAt: stats.lastAt,
        openNotes: notes.openNotes,
      })
      .from(sheetRevisions)
      .innerJoin(processSheets, eq(processSheets.id, sheetRevisions.sheetId))
      .innerJoin(layerChecks, eq(layerChecks.id, processSheets.checkId))
      .innerJoin(users, eq(users.id, owner))
      .leftJoin(sheetSignatures, eq(sheetSignatures.revisionId, sheetRevisions.id))
      .leftJoin(stats, eq(stats.revisionId, sheetRevisions.id))
      .leftJoin(notes, eq(notes.revisionId, sheetRevisions.id))
      .where(where)
      .orderBy(desc(sheetRevisions.createdAt))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db
      .select({ total: count() })
      .from(sheetRevisions)
      .innerJoin(processSheets, eq(processSheets.id, sheetRevisions.sheetId))
      .where(where),
  ]);
  return { rows, total };
}

/** Totals of one revision's batches. */
export async function findRevisionStats(db: DbOrTx, revisionId: string) {
  const [row] = await db
    .select({
      readingCount: sql<number>`coalesce(sum(${gaugeBatches.readingCount}), 0)::int`,
      overCount: sql<number>`coalesce(sum(${gaugeBatches.overCount}), 0)::int`,
      lastAt: sql<string | null>`max(${gaugeBatches.createdAt})`,
    })
    .from(gaugeBatches)
    .where(eq(gaugeBatches.revisionId, revisionId));
  const [notes] = await db
    .select({ openNotes: count() })
    .from(gaugeNotes)
    .where(and(eq(gaugeNotes.revisionId, revisionId), sql`${gaugeNotes.state} <> 'closed'`));
  return { readingCount: row.readingCount, overCount: row.overCount, lastAt: row.lastAt ? new Date(row.lastAt) : null, openNotes: notes.openNotes };
}

export type NewBatchRow = typeof gaugeBatches.$inferInsert;

export async function insertBatch(db: DbOrTx, values: NewBatchRow): Promise<BatchRow> {
  const [row] = await db.insert(gaugeBatches).values(values).returning();
  return row;
}

export async function findBatchByClientId(db: DbOrTx, tokenId: string, clientBatchId: string): Promise<BatchRow | undefined> {
  const [row] = await db
    .select()
    .from(gaugeBatches)
    .where(and(eq(gaugeBatches.tokenId, tokenId), eq(gaugeBatches.clientBatchId, clientBatchId)))
    .limit(1);
  return row;
}

export async function findBatchPage(db: DbOrTx, revisionId: string, page: { page: number; pageSize: number }) {
  const where = eq(gaugeBatches.revisionId, revisionId);
  const [rows, [{ total }]] = await Promise.all([
    db
      .select()
      .from(gaugeBatches)
      .where(where)
      .orderBy(desc(gaugeBatches.createdAt))
      .limit(page.pageSize)
      .offset((page.page - 1) * page.pageSize),
    db.select({ total: count() }).from(gaugeBatches).where(where),
  ]);
  return { rows, total };
}

/** Column arrays for one bulk insert of readings (unnest: one statement per chunk). */
export interface ReadingColumns {
  sequence: number[];
  run: string[];
  position: (number | null)[];
  measuredAt: (string | null)[];
  direction: ('md' | 'cd' | null)[];
  enteredThickness: number[];
  enteredUnit: string[];
  wetThickness: number[];
  substrateTemperature: (number | null)[];
  airTemperature: (number | null)[];
  operator: (string | null)[];
  margin: (number | null)[];
  flag: ('quiet' | 'close' | 'over')[];
}

const CHUNK = 25_000;

/**
 * Insert many readings of one batch quickly: each chunk is a single INSERT … SELECT FROM unnest(…)
 * with one array parameter per column, instead of one bound parameter per cell.
 */
export async function insertReadings(db: DbOrTx, batchId: string, revisionId: string, source: 'upload' | 'device', columns: ReadingColumns): Promise<void> {
  const n = columns.run.length;
  for (let start = 0; start < n; start += CHUNK) {
    const end = Math.min(n, start + CHUNK);
    const part = <T>(values: T[]) => sql.param(values.slice(start, end));
    await db.execute(sql`
      insert into gauge_readings (batch_id, revision_id, source, sequence, run, position, measured_at, direction,
        entered_thickness, entered_unit, wet_thickness, substrate_temperature, air_temperature, operator, margin, flag)
      select ${batchId}::uuid, ${revisionId}::uuid, ${source}::gauge_source, t.*
      from unnest(
        ${part(columns.sequence)}::int[], ${part(columns.run)}::text[], ${part(columns.position)}::float8[],
        ${part(columns.measuredAt)}::timestamptz[], ${part(columns.direction)}::gauge_direction[],
        ${part(columns.enteredThickness)}::float8[], ${part(columns.enteredUnit)}::text[], ${part(columns.wetThickness)}::float8[],
        ${part(columns.substrateTemperature)}::float8[], ${part(columns.airTemperature)}::float8[], ${part(columns.operator)}::text[],
        ${part(columns.margin)}::float8[], ${part(columns.flag)}::gauge_flag[]
      ) as t`);
  }
}

export async function findReadingPage(db: DbOrTx, revisionId: string, query: { page: number; pageSize: number; flag?: string; run?: string }) {
  const conditions: SQL[] = [eq(gaugeReadings.revisionId, revisionId)];
  if (query.flag) conditions.push(eq(gaugeReadings.flag, query.flag as 'quiet'));
  if (query.run) conditions.push(eq(gaugeReadings.run, query.run));
  const where = and(...conditions);
  const [rows, [{ total }]] = await Promise.all([
    db
      .select()
      .from(gaugeReadings)
      .where(where)
      .orderBy(asc(gaugeReadings.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(gaugeReadings).where(where),
  ]);
  return { rows, total };
}

/** Readings in measuring order (id order), optionally of one run and flag, at most `limit` (newest kept). */
export async function findReadingsInOrder(db: DbOrTx, revisionId: string, filter: { run?: string; flag?: string; direction?: 'md' | 'cd'; limit?: number }) {
  const conditions: SQL[] = [eq(gaugeReadings.revisionId, revisionId)];
  if (filter.run) conditions.push(eq(gaugeReadings.run, filter.run));
  if (filter.flag) conditions.push(eq(gaugeReadings.flag, filter.flag as 'quiet'));
  if (filter.direction) conditions.push(eq(gaugeReadings.direction, filter.direction));
  const where = and(...conditions);
  if (filter.limit === undefined) return db.select().from(gaugeReadings).where(where).orderBy(asc(gaugeReadings.id));
  const rows = await db.select().from(gaugeReadings).where(where).orderBy(desc(gaugeReadings.id)).limit(filter.limit);
  return rows.reverse();
}

export async function countReadings(db: DbOrTx, revisionId: string, run?: string): Promise<number> {
  const [{ total }] = await db
    .select({ total: count() })
    .from(gaugeReadings)
    .where(and(eq(gaugeReadings.revisionId, revisionId), run ? eq(gaugeReadings.run, run) : undefined));
  return total;
}

export async function findRunSummaries(db: DbOrTx, revisionId: string) {
  return db
    .select({
      run: gaugeReadings.run,
      count: sql<number>`count(*)::int`,
      minThickness: sql<number>`min(${gaugeReadings.wetThickness})`,
      maxThickness: sql<number>`max(${gaugeReadings.wetThickness})`,
      meanThickness: sql<number>`avg(${gaugeReadings.wetThickness})::float8`,
      closeCount: sql<number>`count(*) filter (where ${gaugeReadings.flag} = 'close')::int`,
      overCount: sql<number>`count(*) filter (where ${gaugeReadings.flag} = 'over')::int`,
      worstMargin: sql<number | null>`min(${gaugeReadings.margin})`,
      firstAt: sql<string | null>`min(${gaugeReadings.measuredAt})`,
      lastAt: sql<string | null>`max(${gaugeReadings.measuredAt})`,
      firstId: sql<number>`min(${gaugeReadings.id})`,
    })
    .from(gaugeReadings)
    .where(eq(gaugeReadings.revisionId, revisionId))
    .groupBy(gaugeReadings.run)
    .orderBy(sql`min(${gaugeReadings.id})`);
}

// ---------------------------------------------------------------------------------------------
// Tokens
// ---------------------------------------------------------------------------------------------

export async function insertToken(db: DbOrTx, values: typeof gaugeTokens.$inferInsert): Promise<TokenRow> {
  const [row] = await db.insert(gaugeTokens).values(values).returning();
  return row;
}

export async function findTokenByHash(db: DbOrTx, tokenHash: string): Promise<TokenRow | undefined> {
  const [row] = await db.select().from(gaugeTokens).where(eq(gaugeTokens.tokenHash, tokenHash)).limit(1);
  return row;
}

export async function findTokenById(db: DbOrTx, id: string): Promise<TokenRow | undefined> {
  const [row] = await db.select().from(gaugeTokens).where(eq(gaugeTokens.id, id)).limit(1);
  return row;
}

export async function listTokens(db: DbOrTx, sheetId?: string) {
  return db
    .select({ token: gaugeTokens, sheetNumber: processSheets.number, createdByName: users.displayName })
    .from(gaugeTokens)
    .innerJoin(processSheets, eq(processSheets.id, gaugeTokens.sheetId))
    .innerJoin(users, eq(users.id, gaugeTokens.createdBy))
    .where(sheetId ? eq(gaugeTokens.sheetId, sheetId) : undefined)
    .orderBy(desc(gaugeTokens.createdAt));
}

export async function revokeToken(db: DbOrTx, id: string, userId: string): Promise<TokenRow | undefined> {
  const [row] = await db
    .update(gaugeTokens)
    .set({ revokedAt: new Date(), revokedBy: userId })
    .where(and(eq(gaugeTokens.id, id), isNull(gaugeTokens.revokedAt)))
    .returning();
  return row;
}

export async function touchToken(db: DbOrTx, id: string): Promise<void> {
  await db.update(gaugeTokens).set({ lastUsedAt: new Date() }).where(eq(gaugeTokens.id, id));
}

// ---------------------------------------------------------------------------------------------
// Nonconformance notes
// ---------------------------------------------------------------------------------------------

/** Open a note for a run with Over readings, or add to the run's note that is not closed yet. */
export async function openOrAddToNote(db: DbOrTx, values: { revisionId: string; run: string; ownerId: string; overCount: number; worstMargin: number | null }) {
  const [row] = await db
    .insert(gaugeNotes)
    .values({ ...values, state: 'open' })
    .onConflictDoUpdate({
      target: [gaugeNotes.revisionId, gaugeNotes.run],
      targetWhere: sql`state <> 'closed'`,
      set: {
        overCount: sql`${gaugeNotes.overCount} + excluded.over_count`,
        worstMargin: sql`least(${gaugeNotes.worstMargin}, excluded.worst_margin)`,
        // New Over readings after a disposition reopen the note: the disposition must be looked at again.
        state: 'open',
      },
    })
    .returning({ id: gaugeNotes.id, run: gaugeNotes.run });
  return row;
}

export async function findNotePage(db: DbOrTx, query: { page: number; pageSize: number; state?: string; revisionId?: string; ids?: string[] }) {
  const conditions: SQL[] = [];
  if (query.state) conditions.push(eq(gaugeNotes.state, query.state as 'open'));
  if (query.revisionId) conditions.push(eq(gaugeNotes.revisionId, query.revisionId));
  if (query.ids) conditions.push(inArray(gaugeNotes.id, query.ids));
  const where = conditions.length > 0 ? and(...conditions) : undefined;
  const [rows, [{ total }]] = await Promise.all([
    db
      .select({
        note: gaugeNotes,
        sheetNumber: processSheets.number,
        title: sheetRevisions.title,
        line: sheetRevisions.line,
        ownerName: users.displayName,
        dispositionByName: sql<string | null>`(select display_name from users u where u.id = ${gaugeNotes.dispositionBy})`,
      })
      .from(gaugeNotes)
      .innerJoin(sheetRevisions, eq(sheetRevisions.id, gaugeNotes.revisionId))
      .innerJoin(processSheets, eq(processSheets.id, sheetRevisions.sheetId))
      .innerJoin(users, eq(users.id, gaugeNotes.ownerId))
      .where(where)
      .orderBy(desc(gaugeNotes.openedAt))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(gaugeNotes).where(where),
  ]);
  return { rows, total };
}

export async function findNoteForUpdate(db: DbOrTx, id: string): Promise<NoteRow | undefined> {
  const [row] = await db.select().from(gaugeNotes).where(eq(gaugeNotes.id, id)).limit(1).for('update');
  return row;
}

export async function updateNote(db: DbOrTx, id: string, values: Partial<typeof gaugeNotes.$inferInsert>): Promise<void> {
  await db.update(gaugeNotes).set(values).where(eq(gaugeNotes.id, id));
}
