import { sql } from 'drizzle-orm';
import {
  bigint,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { layerChecks } from './layer-checks';
import { users } from './users';

/**
 * Drying path set-ups: the whole Drying path input (SI, as validated) saved against one revision of
 * a layer check, with a summary of its result (verdict, onset, zone loads) for lists and process sheets.
 */
export const dryingSetups = pgTable(
  'drying_setups',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    checkId: uuid('check_id')
      .notNull()
      .references(() => layerChecks.id),
    revision: integer('revision').notNull(),
    title: text('title').notNull(),
    input: jsonb('input').notNull(),
    resultSummary: jsonb('result_summary').notNull(),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('drying_setups_check_idx').on(table.checkId, table.revision, table.createdAt)],
);

export const spreadStatusEnum = pgEnum('spread_status', ['queued', 'running', 'done', 'failed']);

/**
 * A Property spread of a layer check revision. `plan` is the frozen, JSON-safe run description
 * (physics core SpreadPlan); small runs are stored 'done' at once, large ones are worked through
 * by the job queue chunk by chunk (`property_spread_chunks`), so progress shows and a restarted
 * worker continues from the stored chunks.
 */
export const propertySpreads = pgTable(
  'property_spreads',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    checkId: uuid('check_id')
      .notNull()
      .references(() => layerChecks.id),
    revision: integer('revision').notNull(),
    status: spreadStatusEnum('status').notNull(),
    samples: integer('samples').notNull(),
    seed: bigint('seed', { mode: 'number' }).notNull(),
    chunkSize: integer('chunk_size').notNull(),
    /** The uncertainties used (after defaults and overrides), as sent back to people. */
    uncertainties: jsonb('uncertainties').notNull(),
    /** The physical layer (SI) the spread ran on. */
    layer: jsonb('layer').notNull(),
    plan: jsonb('plan').notNull(),
    /** Which evaluator the run uses (surrogate or solver) and its validation. */
    evaluator: jsonb('evaluator'),
    evaluatedSamples: integer('evaluated_samples').notNull().default(0),
    result: jsonb('result'),
    error: text('error'),
    jobId: text('job_id'),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
  },
  (table) => [
    index('property_spreads_check_idx').on(table.checkId, table.revision, table.createdAt),
    index('property_spreads_status_idx').on(table.status),
    check('property_spreads_samples_range', sql`${table.samples} between 1 and 1000000`),
    check('property_spreads_evaluated_range', sql`${table.evaluatedSamples} between 0 and ${table.samples}`),
  ],
);

/** One stored piece of a queued Property spread: samples [start, end) and their tallies (SpreadChunk). */
export const propertySpreadChunks = pgTable(
  'property_spread_chunks',
  {
    spreadId: uuid('spread_id')
      .notNull()
      .references(() => propertySpreads.id, { onDelete: 'cascade' }),
    start: integer('start').notNull(),
    end: integer('end').notNull(),
    chunk: jsonb('chunk').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [primaryKey({ columns: [table.spreadId, table.start] })],
);

/**
 * The heats (or lots) register: mill-test sulfur and oxygen per heat number, in wt %, as read
 * from the mill-test report. Values as entered are kept beside the numbers.
 */
export const heats = pgTable(
  'heats',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    heatNumber: text('heat_number').notNull(),
    supplier: text('supplier').notNull().default(''),
    product: text('product').notNull().default(''),
    sulfurWtPercent: doublePrecision('sulfur_wt_percent').notNull(),
    sulfurText: text('sulfur_text').notNull(),
    oxygenWtPercent: doublePrecision('oxygen_wt_percent'),
    oxygenText: text('oxygen_text'),
    notes: text('notes').notNull().default(''),
    version: integer('version').notNull().default(1),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    uniqueIndex('heats_heat_number_unique').on(sql`lower(${table.heatNumber})`),
    check('heats_sulfur_range', sql`${table.sulfurWtPercent} >= 0 and ${table.sulfurWtPercent} <= 1`),
    check('heats_oxygen_range', sql`${table.oxygenWtPercent} is null or (${table.oxygenWtPercent} >= 0 and ${table.oxygenWtPercent} <= 1)`),
  ],
);

/**
 * Melt pool flow set-ups: the pool input saved against a layer check revision (melt-pool kind),
 * with the two heats being joined and a summary of the result and the sulfur comparison.
 */
export const meltPoolSetups = pgTable(
  'melt_pool_setups',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    checkId: uuid('check_id')
      .notNull()
      .references(() => layerChecks.id),
    revision: integer('revision').notNull(),
    input: jsonb('input').notNull(),
    firstHeatId: uuid('first_heat_id').references(() => heats.id),
    secondHeatId: uuid('second_heat_id').references(() => heats.id),
    resultSummary: jsonb('result_summary').notNull(),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('melt_pool_setups_check_idx').on(table.checkId, table.revision, table.createdAt)],
);
