import { and, count, desc, eq, inArray, ilike, lt, ne, or, sql, type SQL } from 'drizzle-orm';

import type { z } from 'zod';
import type { Role } from '../../../shared/schemas/roles';
import type { sheetListQuerySchema } from '../../../shared/schemas/sheets';
import type { DbOrTx } from '../../db/client';
import { escapeLike } from '../../db/escape-like';
import { auditEvents } from '../../db/schema/audit';
import { dryingSetups, propertySpreads } from '../../db/schema/beyond-onset';
import { fluids } from '../../db/schema/fluids';
import { checkRevisions, layerChecks } from '../../db/schema/layer-checks';
import { processSheets, sheetNumberCounters, sheetReturns, sheetRevisions, sheetSignatures } from '../../db/schema/sheets';
import { users } from '../../db/schema/users';

export type SheetRow = typeof processSheets.$inferSelect;
export type RevisionRow = typeof sheetRevisions.$inferSelect;
export type SignatureRow = typeof sheetSignatures.$inferSelect;
export type ReturnRow = typeof sheetReturns.$inferSelect;

/** Takes the next running sheet number of a site (one atomic upsert; safe under concurrency). */
export async function takeSheetNumber(db: DbOrTx, siteCode: string): Promise<number> {
  const [row] = await db
    .insert(sheetNumberCounters)
    .values({ siteCode, lastNumber: 1 })
    .onConflictDoUpdate({ target: sheetNumberCounters.siteCode, set: { lastNumber: sql`${sheetNumberCounters.lastNumber} + 1` } })
    .returning({ lastNumber: sheetNumberCounters.lastNumber });
  return row.lastNumber;
}

export async function insertSheet(db: DbOrTx, values: typeof processSheets.$inferInsert): Promise<SheetRow> {
  const [row] = await db.insert(processSheets).values(values).returning();
  return row;
}

export async function insertRevision(db: DbOrTx, values: typeof sheetRevisions.$inferInsert): Promise<RevisionRow> {
  const [row] = await db.insert(sheetRevisions).values(values).returning();
  return row;
}

/** Columns of a revision without the signed PDF bytes (those are read only for download). */
const revisionColumns = {
  id: sheetRevisions.id,
  sheetId: sheetRevisions.sheetId,
  revision: sheetRevisions.revision,
  state: sheetRevisions.state,
  title: sheetRevisions.title,
  line: sheetRevisions.line,
  purpose: sheetRevisions.purpose,
  authorId: sheetRevisions.authorId,
  checkRevision: sheetRevisions.checkRevision,
  snapshot: sheetRevisions.snapshot,
  solverVersion: sheetRevisions.solverVersion,
  createdAt: sheetRevisions.createdAt,
  submittedAt: sheetRevisions.submittedAt,
  decidedAt: sheetRevisions.decidedAt,
  pdfSha256: sheetRevisions.pdfSha256,
};
export type RevisionWithoutPdf = Omit<RevisionRow, 'signedPdf'>;

export interface RevisionWithSheet {
  revision: RevisionWithoutPdf;
  sheet: SheetRow;
  authorName: string;
  authorEmail: string;
  latestRevision: number;
}

/** One revision with its sheet, author and the sheet's newest revision number; optionally locked. */
export async function findRevision(db: DbOrTx, id: string, options: { forUpdate?: boolean } = {}): Promise<RevisionWithSheet | undefined> {
  const base = db
    .select({
      revision: revisionColumns,
      sheet: processSheets,
      authorName: users.displayName,
      authorEmail: users.email,
      latestRevision: sql<number>`(select max(r2.revision) from sheet_revisions r2 where r2.sheet_id = ${sheetRevisions.sheetId})`.mapWith(Number),
    })
    .from(sheetRevisions)
    .innerJoin(processSheets, eq(processSheets.id, sheetRevisions.sheetId))
    .innerJoin(users, eq(users.id, sheetRevisions.authorId))
    .where(eq(sheetRevisions.id, id))
    .limit(1);
  const [row] = options.forUpdate ? await base.for('update', { of: sheetRevisions }) : await base;
  return row;
}

/** The stored signed PDF of a revision, if any. */
export async function findSignedPdf(db: DbOrTx, id: string): Promise<Buffer | null> {
  const [row] = await db.select({ pdf: sheetRevisions.signedPdf }).from(sheetRevisions).where(eq(sheetRevisions.id, id)).limit(1);
  return row?.pdf ?? null;
}

export async function listRevisionsOfSheet(db: DbOrTx, sheetId: string) {
  return db
    .select({ id: sheetRevisions.id, revision: sheetRevisions.revision, state: sheetRevisions.state, createdAt: sheetRevisions.createdAt, authorName: users.displayName })
    .from(sheetRevisions)
    .innerJoin(users, eq(users.id, sheetRevisions.authorId))
    .where(eq(sheetRevisions.sheetId, sheetId))
    .orderBy(desc(sheetRevisions.revision));
}

export async function setRevisionState(
  db: DbOrTx,
  id: string,
  values: Partial<Pick<RevisionRow, 'state' | 'submittedAt' | 'decidedAt' | 'signedPdf' | 'pdfSha256'>>,
): Promise<void> {
  await db.update(sheetRevisions).set(values).where(eq(sheetRevisions.id, id));
}

/** Signed revisions of a sheet older than `revision`, locked (they are about to be superseded). */
export async function lockEarlierSigned(db: DbOrTx, sheetId: string, revision: number) {
  return db
    .select({ id: sheetRevisions.id, revision: sheetRevisions.revision })
    .from(sheetRevisions)
    .where(and(eq(sheetRevisions.sheetId, sheetId), eq(sheetRevisions.state, 'signed'), lt(sheetRevisions.revision, revision)))
    .for('update');
}

export async function insertSignature(db: DbOrTx, values: typeof sheetSignatures.$inferInsert): Promise<void> {
  await db.insert(sheetSignatures).values(values);
}

export async function insertReturn(db: DbOrTx, values: typeof sheetReturns.$inferInsert): Promise<void> {
  await db.insert(sheetReturns).values(values);
}

export async function findSignature(db: DbOrTx, revisionId: string): Promise<SignatureRow | undefined> {
  const [row] = await db.select().from(sheetSignatures).where(eq(sheetSignatures.revisionId, revisionId)).limit(1);
  return row;
}

/** Returns of every revision of a sheet up to `revision`, oldest first, with the revision they concern. */
export async function findReturnsOfSheet(db: DbOrTx, sheetId: string, revision: number) {
  return db
    .select({ revision: sheetRevisions.revision, reviewerName: sheetReturns.reviewerName, comments: sheetReturns.comments, returnedAt: sheetReturns.returnedAt })
    .from(sheetReturns)
    .innerJoin(sheetRevisions, eq(sheetRevisions.id, sheetReturns.revisionId))
    .where(and(eq(sheetRevisions.sheetId, sheetId), sql`${sheetRevisions.revision} <= ${revision}`))
    .orderBy(sheetReturns.returnedAt, sheetReturns.id);
}

export async function findReturns(db: DbOrTx, revisionId: string): Promise<ReturnRow[]> {
  return db.select().from(sheetReturns).where(eq(sheetReturns.revisionId, revisionId)).orderBy(sheetReturns.returnedAt);
}

/** The revision signed with exactly this PDF (by SHA-256), with its sheet and signature. */
export async function findBySignedSha(db: DbOrTx, sha256: string) {
  const [row] = await db
    .select({ revision: revisionColumns, sheet: processSheets, signature: sheetSignatures })
    .from(sheetSignatures)
    .innerJoin(sheetRevisions, eq(sheetRevisions.id, sheetSignatures.revisionId))
    .innerJoin(processSheets, eq(processSheets.id, sheetRevisions.sheetId))
    .where(and(eq(sheetSignatures.pdfSha256, sha256), eq(sheetRevisions.pdfSha256, sha256)))
    .limit(1);
  return row;
}

/** A later revision that superseded `revision` of a sheet: the next signed (or superseded) one. */
export async function findSuccessorSigned(db: DbOrTx, sheetId: string, revision: number) {
  const [row] = await db
    .select({ id: sheetRevisions.id, revision: sheetRevisions.revision })
    .from(sheetRevisions)
    .where(and(eq(sheetRevisions.sheetId, sheetId), sql`${sheetRevisions.revision} > ${revision}`, inArray(sheetRevisions.state, ['signed', 'superseded'])))
    .orderBy(sheetRevisions.revision)
    .limit(1);
  return row;
}

export async function findAuditOfRevisions(db: DbOrTx, revisionIds: string[]) {
  if (revisionIds.length === 0) return [];
  return db
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      actorEmail: auditEvents.actorEmail,
      revisionId: auditEvents.entityId,
      reason: auditEvents.reason,
      occurredAt: auditEvents.occurredAt,
    })
    .from(auditEvents)
    .where(and(eq(auditEvents.entityType, 'process_sheet'), inArray(auditEvents.entityId, revisionIds)))
    .orderBy(desc(auditEvents.occurredAt), desc(auditEvents.id))
    .limit(500);
}

const latestOnly = sql`${sheetRevisions.revision} = (select max(r2.revision) from sheet_revisions r2 where r2.sheet_id = ${sheetRevisions.sheetId})`;

/** One page of revisions (by default the newest revision of each sheet), newest sheet first. */
export async function findSheetPage(db: DbOrTx, query: z.output<typeof sheetListQuerySchema>) {
  const conditions: SQL[] = [];
  if (query.state) conditions.push(eq(sheetRevisions.state, query.state));
  if (query.line) conditions.push(eq(sheetRevisions.line, query.line));
  if (query.authorId) conditions.push(eq(sheetRevisions.authorId, query.authorId));
  if (query.q) {
    const pattern = `%${escapeLike(query.q)}%`;
    conditions.push(or(ilike(sheetRevisions.title, pattern), ilike(processSheets.number, pattern)) as SQL);
  }
  if (query.latest) conditions.push(latestOnly);
  const where = conditions.length > 0 ? and(...conditions) : undefined;
  const [rows, [{ total }]] = await Promise.all([
    db
      .select({
        id: sheetRevisions.id,
        sheetId: sheetRevisions.sheetId,
        number: processSheets.number,
        revision: sheetRevisions.revision,
        state: sheetRevisions.state,
        title: sheetRevisions.title,
        line: sheetRevisions.line,
        processKind: sql<string>`${sheetRevisions.snapshot} #>> '{check,processKind}'`,
        authorId: sheetRevisions.authorId,
        authorName: users.displayName,
        createdAt: sheetRevisions.createdAt,
        margin: sql<number | null>`(${sheetRevisions.snapshot} #>> '{results,margin}')::double precision`,
      })
      .from(sheetRevisions)
      .innerJoin(processSheets, eq(processSheets.id, sheetRevisions.sheetId))
      .innerJoin(users, eq(users.id, sheetRevisions.authorId))
      .where(where)
      .orderBy(desc(processSheets.number), desc(sheetRevisions.revision))
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

/** Lines and authors that occur on sheets, for the list filters. */
export async function findSheetFilters(db: DbOrTx) {
  const [lines, authors] = await Promise.all([
    db.selectDistinct({ line: sheetRevisions.line }).from(sheetRevisions).orderBy(sheetRevisions.line),
    db
      .selectDistinct({ id: users.id, name: users.displayName })
      .from(sheetRevisions)
      .innerJoin(users, eq(users.id, sheetRevisions.authorId))
      .orderBy(users.displayName),
  ]);
  return { lines: lines.map((l) => l.line), authors };
}

/** E-mail addresses of active users with a role (who to notify). */
export async function findActiveUsersWithRole(db: DbOrTx, role: Role, options: { except?: string } = {}) {
  const conditions = [eq(users.role, role), eq(users.active, true)];
  if (options.except) conditions.push(ne(users.id, options.except));
  return db.select({ id: users.id, email: users.email, displayName: users.displayName }).from(users).where(and(...conditions));
}

/** The check, one of its revisions (the newest when `revision` is not given) and who saved it. */
export async function findCheckRevisionForSheet(db: DbOrTx, checkId: string, revision?: number) {
  const [check] = await db
    .select({ id: layerChecks.id, title: layerChecks.title, processKind: layerChecks.processKind, latest: layerChecks.revision })
    .from(layerChecks)
    .where(eq(layerChecks.id, checkId))
    .limit(1);
  if (!check) return undefined;
  const [rev] = await db
    .select({ revision: checkRevisions.revision, input: checkRevisions.input, savedAt: checkRevisions.savedAt, savedByName: users.displayName })
    .from(checkRevisions)
    .leftJoin(users, eq(users.id, checkRevisions.savedBy))
    .where(and(eq(checkRevisions.checkId, checkId), eq(checkRevisions.revision, revision ?? check.latest)))
    .limit(1);
  return { check, revision: rev };
}

export async function findFluidForSnapshot(db: DbOrTx, fluidId: string) {
  const [row] = await db
    .select({ id: fluids.id, name: fluids.name, kind: fluids.kind, archived: fluids.archived, definition: fluids.definition, laws: fluids.laws })
    .from(fluids)
    .where(eq(fluids.id, fluidId))
    .limit(1);
  return row;
}


/** The newest drying set-up saved against a check revision (title and stored result summary). */
export async function findLatestDryingSetup(db: DbOrTx, checkId: string, revision: number) {
  const [row] = await db
    .select({ title: dryingSetups.title, summary: dryingSetups.resultSummary })
    .from(dryingSetups)
    .where(and(eq(dryingSetups.checkId, checkId), eq(dryingSetups.revision, revision)))
    .orderBy(desc(dryingSetups.createdAt))
    .limit(1);
  return row;
}

/** The newest finished Property spread of a check revision (its stored result). */
export async function findLatestFinishedSpread(db: DbOrTx, checkId: string, revision: number) {
  const [row] = await db
    .select({ result: propertySpreads.result })
    .from(propertySpreads)
    .where(and(eq(propertySpreads.checkId, checkId), eq(propertySpreads.revision, revision), eq(propertySpreads.status, 'done')))
    .orderBy(desc(propertySpreads.finishedAt))
    .limit(1);
  return row;
}
