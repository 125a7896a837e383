import { sql } from 'drizzle-orm';
import { boolean, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { FluidLaws } from '../../../shared/fluids/fluid-laws';
import type { ReadFluid } from '../../../shared/fluids/read-fluid-input';
import { users } from './users';

export const fluidKindEnum = pgEnum('fluid_kind', ['solvent', 'solution', 'oil', 'molten-metal', 'other']);

/** What a fluid stores of its input: each property as entered, with its source, uncertainty and SI value. */
export type FluidDefinition = Omit<ReadFluid, 'name' | 'kind' | 'notes' | 'laws'>;

/**
 * The fluid library. Fluids are never deleted: `archived` hides them from pickers while checks
 * that use them keep working. `version` drives optimistic concurrency (stale update → 409).
 * The SI columns at the reference temperature exist for sorting the table.
 */
export const fluids = pgTable(
  'fluids',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    name: text('name').notNull(),
    kind: fluidKindEnum('kind').notNull(),
    notes: text('notes').notNull().default(''),
    definition: jsonb('definition').$type<FluidDefinition>().notNull(),
    laws: jsonb('laws').$type<FluidLaws>().notNull(),
    referenceTemperature: doublePrecision('reference_temperature').notNull(),
    density: doublePrecision('density').notNull(),
    viscosityAtReference: doublePrecision('viscosity_at_reference').notNull(),
    surfaceTension: doublePrecision('surface_tension').notNull(),
    surfaceTensionSlope: doublePrecision('surface_tension_slope').notNull(),
    archived: boolean('archived').notNull().default(false),
    version: integer('version').notNull().default(1),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    index('fluids_name_lower_idx').on(sql`lower(${table.name})`),
    index('fluids_kind_idx').on(table.kind),
  ],
);
