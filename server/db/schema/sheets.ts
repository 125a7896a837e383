import { sql } from 'drizzle-orm';
import { bigserial, customType, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import type { SheetSnapshot } from '../../../shared/schemas/sheets';
import { layerChecks } from './layer-checks';
import { roleEnum, users } from './users';

/** PostgreSQL bytea as a Node Buffer (drizzle has no built-in bytea column). */
const bytea = customType<{ data: Buffer; driverData: Buffer }>({
  dataType: () => 'bytea',
});

export const sheetStateEnum = pgEnum('sheet_state', ['draft', 'awaiting-review', 'returned', 'signed', 'superseded']);

/** The last sheet number handed out per site; numbers are taken with one atomic upsert. */
export const sheetNumberCounters = pgTable('sheet_number_counters', {
  siteCode: text('site_code').primaryKey(),
  lastNumber: integer('last_number').notNull(),
});

/**
 * A process sheet: the numbered document ("LC-PS-0001"). Its content lives in its revisions.
 * Nothing here changes after it is created.
 */
export const processSheets = pgTable(
  'process_sheets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    number: text('number').notNull(),
    siteCode: text('site_code').notNull(),
    checkId: uuid('check_id')
      .notNull()
      .references(() => layerChecks.id),
    createdBy: uuid('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('process_sheets_number_unique').on(table.number)],
);

/**
 * One revision of a process sheet, with the frozen snapshot it was issued from. A database trigger
 * (custom migration) forbids UPDATE and DELETE of a Signed or Superseded revision, except the one
 * change Signed → Superseded of the state column alone.
 */
export const sheetRevisions = pgTable(
  'sheet_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    sheetId: uuid('sheet_id')
      .notNull()
      .references(() => processSheets.id),
    revision: integer('revision').notNull(),
    state: sheetStateEnum('state').notNull().default('draft'),
    title: text('title').notNull(),
    line: text('line').notNull(),
    purpose: text('purpose').notNull(),
    authorId: uuid('author_id')
      .notNull()
      .references(() => users.id),
    checkRevision: integer('check_revision').notNull(),
    snapshot: jsonb('snapshot').$type<SheetSnapshot>().notNull(),
    solverVersion: text('solver_version').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    submittedAt: timestamp('submitted_at', { withTimezone: true }),
    decidedAt: timestamp('decided_at', { withTimezone: true }),
    /** The PDF as signed (signature block filled); null until signed. */
    signedPdf: bytea('signed_pdf'),
    /** Lower-case hex SHA-256 of `signed_pdf`. */
    pdfSha256: text('pdf_sha256'),
  },
  (table) => [
    uniqueIndex('sheet_revisions_sheet_revision_unique').on(table.sheetId, table.revision),
    uniqueIndex('sheet_revisions_pdf_sha256_unique').on(table.pdfSha256).where(sql`pdf_sha256 is not null`),
    index('sheet_revisions_state_idx').on(table.state, table.createdAt),
    index('sheet_revisions_author_idx').on(table.authorId),
    index('sheet_revisions_line_idx').on(table.line),
  ],
);

/**
 * The electronic signature of a revision (21 CFR 11.50: printed name, date and time, meaning),
 * bound to the SHA-256 of the PDF as signed (11.70). Never updated or deleted (trigger).
 */
export const sheetSignatures = pgTable(
  'sheet_signatures',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => sheetRevisions.id),
    signerId: uuid('signer_id')
      .notNull()
      .references(() => users.id),
    printedName: text('printed_name').notNull(),
    signerRole: roleEnum('signer_role').notNull(),
    meaning: text('meaning').notNull(),
    signedAt: timestamp('signed_at', { withTimezone: true }).notNull(),
    pdfSha256: text('pdf_sha256').notNull(),
  },
  (table) => [uniqueIndex('sheet_signatures_revision_unique').on(table.revisionId), index('sheet_signatures_sha_idx').on(table.pdfSha256)],
);

/** A reviewer's return of a revision with comments; append-only (trigger). */
export const sheetReturns = pgTable(
  'sheet_returns',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => sheetRevisions.id),
    reviewerId: uuid('reviewer_id')
      .notNull()
      .references(() => users.id),
    reviewerName: text('reviewer_name').notNull(),
    comments: text('comments').notNull(),
    returnedAt: timestamp('returned_at', { withTimezone: true }).notNull(),
  },
  (table) => [index('sheet_returns_revision_idx').on(table.revisionId)],
);
