import { sql } from 'drizzle-orm';
import { bigserial, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import type { LayerCheckInputParsed } from '../../../shared/schemas/layer-checks';
import { fluids } from './fluids';
import { users } from './users';

export const processKindEnum = pgEnum('process_kind', ['drying-coat', 'cast-film', 'melt-pool', 'general-layer']);

/**
 * A layer check: the whole input as entered (`input`), plus columns for listing, sorting and
 * filtering. `revision` counts saves that changed the check; `version` drives optimistic
 * concurrency. The margin and regime are computed at save time so the list can show them.
 */
export const layerChecks = pgTable(
  'layer_checks',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    title: text('title').notNull(),
    processKind: processKindEnum('process_kind').notNull(),
    fluidId: uuid('fluid_id')
      .notNull()
      .references(() => fluids.id),
    ownerId: uuid('owner_id').references(() => users.id),
    input: jsonb('input').$type<LayerCheckInputParsed>().notNull(),
    depthText: text('depth_text').notNull(),
    depthSi: doublePrecision('depth_si').notNull(),
    savedMargin: doublePrecision('saved_margin'),
    savedRegime: text('saved_regime'),
    revision: integer('revision').notNull().default(1),
    version: integer('version').notNull().default(1),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    index('layer_checks_updated_at_idx').on(table.updatedAt),
    index('layer_checks_title_lower_idx').on(sql`lower(${table.title})`),
    // Title search is ILIKE '%…%'; a trigram index answers it (and its count) without reading every row.
    // pg_trgm is created by migration 0009.
    index('layer_checks_title_trgm_idx').using('gin', table.title.op('gin_trgm_ops')),
    index('layer_checks_fluid_idx').on(table.fluidId),
    index('layer_checks_process_kind_idx').on(table.processKind, table.updatedAt),
    index('layer_checks_owner_idx').on(table.ownerId, table.updatedAt),
    index('layer_checks_depth_idx').on(table.depthSi),
    index('layer_checks_margin_idx').on(table.savedMargin),
  ],
);

/** Every saved revision of a check with its full input; never updated or deleted. */
export const checkRevisions = pgTable(
  'check_revisions',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    checkId: uuid('check_id')
      .notNull()
      .references(() => layerChecks.id),
    revision: integer('revision').notNull(),
    input: jsonb('input').notNull(),
    savedBy: uuid('saved_by').references(() => users.id),
    savedAt: timestamp('saved_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [uniqueIndex('check_revisions_check_revision_unique').on(table.checkId, table.revision)],
);
