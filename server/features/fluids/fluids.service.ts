import type { z } from 'zod';
import { readFluidInput, type ReadFluid } from '../../../shared/fluids/read-fluid-input';
import {
  fluidInputSchema,
  type Fluid,
  type FluidCsvPreview,
  type FluidInputParsed,
  type FluidSummary,
  type fluidListQuerySchema,
  type updateFluidInputSchema,
} from '../../../shared/schemas/fluids';
import type { CurrentUser } from '../../auth/current-user';
import type { Database, DbOrTx } from '../../db/client';
import { NotFoundError, UnprocessableError } from '../../errors';
import { recordAuditEvent } from '../audit/record-audit-event';
import { parseFluidCsv, fluidsToCsv } from './fluid-csv';
import { fluidColumns, fluidInputOf, toFluid, toFluidSummary } from './fluid-records';
import {
  countChecksUsingFluid,
  findAllFluids,
  findFluidById,
  findFluidForUpdate,
  findFluidPage,
  insertFluids,
  updateFluidIfVersion,
  type FluidRow,
} from './fluids.repository';
import { StaleVersionError } from './stale-version-error';

export interface RequestMeta {
  requestId?: string;
}

const actorOf = (user: CurrentUser) => ({ id: user.id, email: user.email });

/** Reads a fluid into SI or throws 422 naming every field that is wrong. */
export function readFluidOrThrow(input: FluidInputParsed, pathPrefix = ''): ReadFluid {
  const result = readFluidInput(input);
  if (!result.ok) {
    const fields = Object.fromEntries(Object.entries(result.fields).map(([k, v]) => [pathPrefix + k, v]));
    const first = Object.entries(fields)[0];
    throw new UnprocessableError(`Some values are not right: ${first[0]}: ${first[1]}`, fields);
  }
  return result.fluid;
}

/** One page of the fluid table. */
export async function listFluids(
  db: DbOrTx,
  query: z.output<typeof fluidListQuerySchema>,
): Promise<{ items: FluidSummary[]; total: number }> {
  const { rows, total } = await findFluidPage(db, query);
  return { items: rows.map(toFluidSummary), total };
}

/** One fluid with the number of checks that use it; 404 when unknown. */
export async function getFluid(db: DbOrTx, id: string): Promise<Fluid> {
  const row = await findFluidById(db, id);
  if (!row) throw new NotFoundError('There is no fluid with this id.');
  return toFluid(row, await countChecksUsingFluid(db, id));
}

/** Creates a fluid (units read, ranges checked) and records it in the audit trail. */
export async function createFluid(db: Database, user: CurrentUser, input: FluidInputParsed, meta: RequestMeta = {}): Promise<Fluid> {
  const fluid = readFluidOrThrow(input);
  return db.transaction(async (tx) => {
    const [row] = await insertFluids(tx, [{ ...fluidColumns(fluid), createdBy: user.id }]);
    const created = toFluid(row, 0);
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: 'fluid.created',
      entityType: 'fluid',
      entityId: row.id,
      after: created,
      requestId: meta.requestId,
    });
    return created;
  });
}

async function lockFluid(tx: DbOrTx, id: string): Promise<FluidRow> {
  const row = await findFluidForUpdate(tx, id);
  if (!row) throw new NotFoundError('There is no fluid with this id.');
  return row;
}

async function throwStale(tx: DbOrTx, row: FluidRow, sentVersion: number): Promise<never> {
  throw new StaleVersionError('fluid', sentVersion, toFluid(row, await countChecksUsingFluid(tx, row.id)), row.version);
}

/** Replaces a fluid's values when `version` is current; 409 with the current fluid when stale. */
export async function updateFluid(
  db: Database,
  user: CurrentUser,
  id: string,
  input: z.output<typeof updateFluidInputSchema>,
  meta: RequestMeta = {},
): Promise<Fluid> {
  const { version, ...fields } = input;
  const fluid = readFluidOrThrow(fields);
  return db.transaction(async (tx) => {
    const before = await lockFluid(tx, id);
    if (before.version !== version) await throwStale(tx, before, version);
    const checkCount = await countChecksUsingFluid(tx, id);
    const row = await updateFluidIfVersion(tx, id, version, fluidColumns(fluid));
    if (!row) await throwStale(tx, before, version);
    const after = toFluid(row as FluidRow, checkCount);
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: 'fluid.updated',
      entityType: 'fluid',
      entityId: id,
      before: toFluid(before, checkCount),
      after,
      requestId: meta.requestId,
    });
    return after;
  });
}

/** Copies a fluid under a new name ("… (copy)" by default). */
export async function duplicateFluid(
  db: Database,
  user: CurrentUser,
  id: string,
  options: { name?: string },
  meta: RequestMeta = {},
): Promise<Fluid> {
  const source = await findFluidById(db, id);
  if (!source) throw new NotFoundError('There is no fluid with this id.');
  const input = fluidInputSchema.parse({ ...fluidInputOf(source), name: options.name ?? `${source.name} (copy)`.slice(0, 120) });
  const fluid = readFluidOrThrow(input);
  return db.transaction(async (tx) => {
    const [row] = await insertFluids(tx, [{ ...fluidColumns(fluid), createdBy: user.id }]);
    const created = toFluid(row, 0);
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: 'fluid.duplicated',
      entityType: 'fluid',
      entityId: row.id,
      after: created,
      reason: `copy of ${source.id}`,
      requestId: meta.requestId,
    });
    return created;
  });
}

/** Archives (or restores) a fluid. Fluids are never deleted, so checks that use one keep working. */
export async function setFluidArchived(
  db: Database,
  user: CurrentUser,
  id: string,
  options: { archived: boolean; version: number },
  meta: RequestMeta = {},
): Promise<Fluid> {
  return db.transaction(async (tx) => {
    const before = await lockFluid(tx, id);
    if (before.version !== options.version) await throwStale(tx, before, options.version);
    const checkCount = await countChecksUsingFluid(tx, id);
    const row = await updateFluidIfVersion(tx, id, options.version, { archived: options.archived });
    if (!row) await throwStale(tx, before, options.version);
    const after = toFluid(row as FluidRow, checkCount);
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: options.archived ? 'fluid.archived' : 'fluid.restored',
      entityType: 'fluid',
      entityId: id,
      before: { archived: before.archived, version: before.version },
      after: { archived: after.archived, version: after.version },
      reason: options.archived && checkCount > 0 ? `used by ${checkCount} layer check(s): archived, not deleted` : null,
      requestId: meta.requestId,
    });
    return after;
  });
}

/** The whole library (archived too) as CSV, in the import format. */
export async function exportFluidsCsv(db: DbOrTx): Promise<string> {
  const rows = await findAllFluids(db, { includeArchived: true });
  return fluidsToCsv(rows.map(fluidInputOf));
}

/** Reads a CSV without saving anything: rows, line-numbered errors, and whether commit would succeed. */
export function previewFluidCsv(csv: string): FluidCsvPreview {
  const parsed = parseFluidCsv(csv);
  return {
    columns: parsed.columns,
    rows: parsed.rows.map((r) => ({ line: r.line, name: r.name, kind: r.kind, valid: r.errors.length === 0 && r.fluid !== null })),
    errors: parsed.errors,
    ok: parsed.errors.length === 0,
  };
}

/**
 * Saves every fluid of a CSV in ONE transaction, or none: any error (on any line) → 422 whose
 * `fields` are keyed `line.<n>.<column>`, and nothing is written.
 */
export async function commitFluidCsv(
  db: Database,
  user: CurrentUser,
  csv: string,
  meta: RequestMeta = {},
): Promise<{ created: number; ids: string[] }> {
  const parsed = parseFluidCsv(csv);
  if (parsed.errors.length > 0) {
    const fields: Record<string, string> = {};
    for (const e of parsed.errors) fields[`line.${e.line}${e.field ? `.${e.field}` : ''}`] ??= e.message;
    const first = parsed.errors[0];
    throw new UnprocessableError(
      `Nothing was imported: ${parsed.errors.length} problem(s); the first is on line ${first.line}${first.field ? ` (${first.field})` : ''}: ${first.message}`,
      fields,
    );
  }
  const fluidsToSave = parsed.rows.map((r) => r.fluid as ReadFluid);
  return db.transaction(async (tx) => {
    const rows = await insertFluids(
      tx,
      fluidsToSave.map((f) => ({ ...fluidColumns(f), createdBy: user.id })),
    );
    for (const row of rows) {
      await recordAuditEvent(tx, {
        actor: actorOf(user),
        action: 'fluid.imported',
        entityType: 'fluid',
        entityId: row.id,
        after: toFluid(row, 0),
        reason: 'CSV import',
        requestId: meta.requestId,
      });
    }
    return { created: rows.length, ids: rows.map((r) => r.id) };
  });
}
