import { sql } from 'drizzle-orm';
import { bigserial, date, doublePrecision, index, integer, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { processSheets, sheetRevisions } from './sheets';
import { roleEnum, users } from './users';

export const gaugeSourceEnum = pgEnum('gauge_source', ['upload', 'device']);
export const gaugeFlagEnum = pgEnum('gauge_flag', ['quiet', 'close', 'over']);
export const gaugeDirectionEnum = pgEnum('gauge_direction', ['md', 'cd']);
export const gaugeThicknessBasisEnum = pgEnum('gauge_thickness_basis', ['wet', 'dry']);
export const gaugeNoteStateEnum = pgEnum('gauge_note_state', ['open', 'dispositioned', 'closed']);

/**
 * A device token: lets one gauge post readings for one process sheet (and line). Only the SHA-256
 * of the token is stored; the token itself is shown once when issued.
 */
export const gaugeTokens = pgTable(
  'gauge_tokens',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    sheetId: uuid('sheet_id')
      .notNull()
      .references(() => processSheets.id),
    line: text('line').notNull(),
    label: text('label').notNull(),
    tokenHash: text('token_hash').notNull(),
    /** First characters of the token, to recognise it in lists. */
    tokenPrefix: text('token_prefix').notNull(),
    createdBy: uuid('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    lastUsedAt: timestamp('last_used_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    revokedBy: uuid('revoked_by').references(() => users.id),
  },
  (table) => [uniqueIndex('gauge_tokens_hash_unique').on(table.tokenHash), index('gauge_tokens_sheet_idx').on(table.sheetId)],
);

/**
 * One upload or device post: the batch of readings saved together (all or nothing), with the gauge
 * used and its calibration date, and the counts the alert e-mail reports.
 */
export const gaugeBatches = pgTable(
  'gauge_batches',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => sheetRevisions.id),
    source: gaugeSourceEnum('source').notNull(),
    /** Client-chosen id for device posts (idempotency); a generated one for uploads. */
    clientBatchId: text('client_batch_id').notNull(),
    tokenId: uuid('token_id').references(() => gaugeTokens.id),
    uploadedBy: uuid('uploaded_by').references(() => users.id),
    /** The uploaded file's name, for display only. */
    fileName: text('file_name'),
    gaugeType: text('gauge_type'),
    calibrationDate: date('calibration_date', { mode: 'string' }),
    thicknessBasis: gaugeThicknessBasisEnum('thickness_basis').notNull().default('wet'),
    /** Volume solids fraction and thinner (volumes per volume) when dry readings were converted. */
    volumeSolids: doublePrecision('volume_solids'),
    thinner: doublePrecision('thinner'),
    readingCount: integer('reading_count').notNull(),
    quietCount: integer('quiet_count').notNull(),
    closeCount: integer('close_count').notNull(),
    overCount: integer('over_count').notNull(),
    /** Smallest margin in the batch; null when no reading has an onset. */
    worstMargin: doublePrecision('worst_margin'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    index('gauge_batches_revision_idx').on(table.revisionId, table.createdAt),
    uniqueIndex('gauge_batches_token_client_unique').on(table.tokenId, table.clientBatchId).where(sql`token_id is not null`),
  ],
);

/** One judged reading. Judged once, with the signed sheet's snapshot, and never changed. */
export const gaugeReadings = pgTable(
  'gauge_readings',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    batchId: uuid('batch_id')
      .notNull()
      .references(() => gaugeBatches.id),
    /**
     * Copied from the batch for filtering; no foreign key of its own (the batch's key already ties
     * the reading to its revision, and a second per-row check would slow bulk imports).
     */
    revisionId: uuid('revision_id').notNull(),
    /** Order within the batch (file line or array index). */
    sequence: integer('sequence').notNull(),
    run: text('run').notNull(),
    /** Position along the web [m]. */
    position: doublePrecision('position'),
    measuredAt: timestamp('measured_at', { withTimezone: true }),
    direction: gaugeDirectionEnum('direction'),
    enteredThickness: doublePrecision('entered_thickness').notNull(),
    enteredUnit: text('entered_unit').notNull(),
    /** Wet film thickness [m]. */
    wetThickness: doublePrecision('wet_thickness').notNull(),
    /** [K] */
    substrateTemperature: doublePrecision('substrate_temperature'),
    airTemperature: doublePrecision('air_temperature'),
    operator: text('operator'),
    source: gaugeSourceEnum('source').notNull(),
    /** Onset margin at this reading; null = no onset possible. */
    margin: doublePrecision('margin'),
    flag: gaugeFlagEnum('flag').notNull(),
  },
  (table) => [
    index('gauge_readings_revision_run_idx').on(table.revisionId, table.run, table.id),
    index('gauge_readings_revision_flag_idx').on(table.revisionId, table.flag, table.id),
  ],
);

/**
 * A nonconformance note: opened when a run has Over readings; the owner writes a disposition and
 * a QA reviewer closes it with an electronic signature (printed name, role, meaning, time).
 */
export const gaugeNotes = pgTable(
  'gauge_notes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => sheetRevisions.id),
    run: text('run').notNull(),
    state: gaugeNoteStateEnum('state').notNull().default('open'),
    ownerId: uuid('owner_id')
      .notNull()
      .references(() => users.id),
    openedAt: timestamp('opened_at', { withTimezone: true }).notNull().defaultNow(),
    overCount: integer('over_count').notNull(),
    worstMargin: doublePrecision('worst_margin'),
    disposition: text('disposition'),
    dispositionBy: uuid('disposition_by').references(() => users.id),
    dispositionAt: timestamp('disposition_at', { withTimezone: true }),
    closedBy: uuid('closed_by').references(() => users.id),
    closedByName: text('closed_by_name'),
    closedByRole: roleEnum('closed_by_role'),
    closeMeaning: text('close_meaning'),
    closedAt: timestamp('closed_at', { withTimezone: true }),
  },
  (table) => [
    uniqueIndex('gauge_notes_one_open_per_run').on(table.revisionId, table.run).where(sql`state <> 'closed'`),
    index('gauge_notes_state_idx').on(table.state, table.openedAt),
  ],
);
