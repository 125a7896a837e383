import { isDeepStrictEqual } from 'node:util';
import type { z } from 'zod';
import { evaluateLayerCheck } from '../../../shared/fluids/evaluate-layer-check';
import type { FluidLaws } from '../../../shared/fluids/fluid-laws';
import type { LayerFields } from '../../../shared/fluids/read-layer-input';
import { buildQuietWindow } from '../../../shared/fluids/build-quiet-window';
import type {
  LayerCheck,
  LayerCheckInputParsed,
  LayerCheckRevision,
  LayerCheckSummary,
  LayerEvaluation,
  QuietWindow,
  evaluateLayerCheckInputSchema,
  layerCheckListQuerySchema,
  quietWindowQuerySchema,
  updateLayerCheckInputSchema,
} from '../../../shared/schemas/layer-checks';
import type { CurrentUser } from '../../auth/current-user';
import type { Database, DbOrTx } from '../../db/client';
import { NotFoundError, UnprocessableError } from '../../errors';
import { recordAuditEvent } from '../audit/record-audit-event';
import { readFluidOrThrow, type RequestMeta } from '../fluids/fluids.service';
import { StaleVersionError } from '../fluids/stale-version-error';
import {
  findCheckById,
  findCheckPage,
  findFluidLaws,
  findRevisions,
  insertCheck,
  insertRevision,
  updateCheckIfVersion,
  type LayerCheckWithNames,
} from './layer-checks.repository';
import { createEvaluationMemo } from './evaluation-memo';

const actorOf = (user: CurrentUser) => ({ id: user.id, email: user.email });
const evaluationMemo = createEvaluationMemo<ReturnType<typeof evaluateLayerCheck>>();

function throwFields(fields: Record<string, string>): never {
  const [path, message] = Object.entries(fields)[0];
  throw new UnprocessableError(`Some values are not right: ${path === '_' ? '' : `${path}: `}${message}`, fields);
}

/** Evaluates or throws 422 naming the fields. */
function evaluateOrThrow(check: LayerFields, laws: FluidLaws, archived: boolean): LayerEvaluation {
  const result = evaluationMemo.remember(check, laws, archived, () => evaluateLayerCheck(check, laws, { archived }));
  if (!result.ok) throwFields(result.fields);
  return result.value;
}

function toLayerCheck(row: LayerCheckWithNames): LayerCheck {
  const { check } = row;
  const input = check.input;
  return {
    id: check.id,
    title: check.title,
    notes: input.notes,
    fluidId: check.fluidId,
    fluidName: row.fluidName,
    fluidArchived: row.fluidArchived,
    processKind: check.processKind,
    temperature: input.temperature,
    depth: input.depth,
    bottom: input.bottom,
    top: input.top,
    deformableSurface: input.deformableSurface,
    heating: input.heating,
    lateral: input.lateral ?? null,
    panelWidth: input.panelWidth ?? null,
    soluteFractionDifference: input.soluteFractionDifference ?? null,
    alertThreshold: input.alertThreshold,
    ownerId: check.ownerId,
    ownerName: row.ownerName,
    revision: check.revision,
    version: check.version,
    savedMargin: check.savedMargin,
    savedRegime: check.savedRegime,
    createdAt: check.createdAt.toISOString(),
    updatedAt: check.updatedAt.toISOString(),
  };
}

async function fluidForCheck(db: DbOrTx, fluidId: string) {
  const fluid = await findFluidLaws(db, fluidId);
  if (!fluid) throw new UnprocessableError('There is no fluid with this id.', { fluidId: 'there is no fluid with this id' });
  return fluid;
}

/** One stored form of an input: optional parts explicit (null), as JSON would store them. */
function normalizeInput(input: LayerCheckInputParsed): LayerCheckInputParsed {
  return JSON.parse(
    JSON.stringify({
      ...input,
      lateral: input.lateral ?? null,
      panelWidth: input.panelWidth ?? null,
      soluteFractionDifference: input.soluteFractionDifference ?? null,
    }),
  ) as LayerCheckInputParsed;
}

/** The columns a check's input fills (evaluated for the saved margin and regime). */
function checkColumns(input: LayerCheckInputParsed, evaluation: LayerEvaluation) {
  return {
    title: input.title,
    processKind: input.processKind,
    fluidId: input.fluidId,
    input,
    depthText: input.depth,
    depthSi: evaluation.operatingPoint.depth,
    savedMargin: evaluation.margin,
    savedRegime: evaluation.regime,
  };
}

/** One page of checks. */
export async function listLayerChecks(
  db: DbOrTx,
  query: z.output<typeof layerCheckListQuerySchema>,
): Promise<{ items: LayerCheckSummary[]; total: number }> {
  const { rows, total } = await findCheckPage(db, query);
  return { items: rows.map((r) => ({ ...r, updatedAt: r.updatedAt.toISOString() })), total };
}

export async function getLayerCheck(db: DbOrTx, id: string): Promise<LayerCheck> {
  const row = await findCheckById(db, id);
  if (!row) throw new NotFoundError('There is no layer check with this id.');
  return toLayerCheck(row);
}

/** Creates a check (owner = the engineer), its revision 1, and an audit event. */
export async function createLayerCheck(db: Database, user: CurrentUser, rawInput: LayerCheckInputParsed, meta: RequestMeta = {}): Promise<LayerCheck> {
  const input = normalizeInput(rawInput);
  const fluid = await fluidForCheck(db, input.fluidId);
  if (fluid.archived) throw new UnprocessableError('This fluid is archived; pick an active fluid or restore it first.', { fluidId: 'the fluid is archived' });
  const evaluation = evaluateOrThrow(input, fluid.laws, fluid.archived);
  const id = await db.transaction(async (tx) => {
    const row = await insertCheck(tx, { ...checkColumns(input, evaluation), ownerId: user.id });
    await insertRevision(tx, { checkId: row.id, revision: 1, input, savedBy: user.id });
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: 'layer_check.created',
      entityType: 'layer_check',
      entityId: row.id,
      after: { revision: 1, input, margin: evaluation.margin, regime: evaluation.regime },
      requestId: meta.requestId,
    });
    return row.id;
  });
  return getLayerCheck(db, id);
}

/**
 * Saves a check when `version` is current (409 with the current check when stale). A save that
 * changes the input makes a new revision; a save with nothing changed returns the check as is.
 */
export async function updateLayerCheck(
  db: Database,
  user: CurrentUser,
  id: string,
  body: z.output<typeof updateLayerCheckInputSchema>,
  meta: RequestMeta = {},
): Promise<LayerCheck> {
  const { version, ...rawInput } = body;
  const input = normalizeInput(rawInput);
  const fluid = await fluidForCheck(db, input.fluidId);
  const evaluation = evaluateOrThrow(input, fluid.laws, fluid.archived);
  await db.transaction(async (tx) => {
    const before = await findCheckById(tx, id, { forUpdate: true });
    if (!before) throw new NotFoundError('There is no layer check with this id.');
    if (before.check.version !== version) throw new StaleVersionError('layer check', version, toLayerCheck(before), before.check.version);
    if (isDeepStrictEqual(normalizeInput(before.check.input), input)) return;
    if (fluid.archived && before.check.fluidId !== input.fluidId) {
      throw new UnprocessableError('This fluid is archived; pick an active fluid or restore it first.', { fluidId: 'the fluid is archived' });
    }
    const revision = before.check.revision + 1;
    const row = await updateCheckIfVersion(tx, id, version, { ...checkColumns(input, evaluation), revision });
    if (!row) throw new StaleVersionError('layer check', version, toLayerCheck(before), before.check.version + 1);
    await insertRevision(tx, { checkId: id, revision, input, savedBy: user.id });
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: 'layer_check.revised',
      entityType: 'layer_check',
      entityId: id,
      before: { revision: before.check.revision, input: before.check.input, margin: before.check.savedMargin },
      after: { revision, input, margin: evaluation.margin, regime: evaluation.regime },
      requestId: meta.requestId,
    });
  });
  return getLayerCheck(db, id);
}

export async function listLayerCheckRevisions(db: DbOrTx, id: string): Promise<LayerCheckRevision[]> {
  const check = await findCheckById(db, id);
  if (!check) throw new NotFoundError('There is no layer check with this id.');
  const rows = await findRevisions(db, id);
  return rows.map((r) => ({ ...r, savedAt: r.savedAt.toISOString() }));
}

type EvaluateBody = z.output<typeof evaluateLayerCheckInputSchema>;

/** Resolves the fluid of an evaluate body: one lookup by id, or the inline fluid read into SI. */
async function lawsOf(db: DbOrTx, body: EvaluateBody): Promise<{ laws: FluidLaws; archived: boolean }> {
  if (body.fluid) return { laws: readFluidOrThrow(body.fluid, 'fluid.').laws, archived: false };
  const fluid = await findFluidLaws(db, body.fluidId as string);
  if (!fluid) throw new UnprocessableError('There is no fluid with this id.', { fluidId: 'there is no fluid with this id' });
  return fluid;
}

/** Live evaluation of an unsaved check: no writes, one fluid lookup (none for an inline fluid). */
export async function evaluateLayerCheckBody(db: DbOrTx, body: EvaluateBody): Promise<LayerEvaluation> {
  const { laws, archived } = await lawsOf(db, body);
  return evaluateOrThrow(body, laws, archived);
}

/** Evaluation of a saved check. */
export async function evaluateSavedLayerCheck(db: DbOrTx, id: string): Promise<LayerEvaluation> {
  const row = await findCheckById(db, id);
  if (!row) throw new NotFoundError('There is no layer check with this id.');
  const fluid = await fluidForCheck(db, row.check.fluidId);
  return evaluateOrThrow(row.check.input, fluid.laws, fluid.archived);
}

type WindowQuery = z.output<typeof quietWindowQuerySchema>;

function windowOrThrow(check: LayerFields, laws: FluidLaws, query: WindowQuery): QuietWindow {
  const result = buildQuietWindow(check, laws, query);
  if (!result.ok) throwFields(result.fields);
  return result.value;
}

/** Quiet window of an unsaved check. */
export async function quietWindowOfBody(db: DbOrTx, body: EvaluateBody, query: WindowQuery): Promise<QuietWindow> {
  const { laws } = await lawsOf(db, body);
  return windowOrThrow(body, laws, query);
}

/** Quiet window of a saved check. */
export async function quietWindowOfCheck(db: DbOrTx, id: string, query: WindowQuery): Promise<QuietWindow> {
  const row = await findCheckById(db, id);
  if (!row) throw new NotFoundError('There is no layer check with this id.');
  const fluid = await fluidForCheck(db, row.check.fluidId);
  return windowOrThrow(row.check.input, fluid.laws, query);
}
