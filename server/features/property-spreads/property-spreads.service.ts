import { readLayerInput } from '../../../shared/fluids/read-layer-input';
import { createLayerSpreadPlan } from '../../../shared/physics/spread/create-layer-spread-plan';
import type { SpreadPropertySpec } from '../../../shared/physics/spread/spread-types';
import type { PhysicalLayer } from '../../../shared/physics/sizing/types';
import {
  INLINE_SPREAD_LIMIT,
  type PropertySpread,
  type SpreadRunResult,
  type SpreadUncertainty,
  type runSpreadInputSchema,
} from '../../../shared/schemas/property-spreads';
import type { z } from 'zod';
import type { CurrentUser } from '../../auth/current-user';
import type { Database, DbOrTx } from '../../db/client';
import { NotFoundError, UnprocessableError } from '../../errors';
import { recordAuditEvent } from '../audit/record-audit-event';
import { findCheckAtRevision } from '../drying-paths/check-revision';
import { withPhysicsFieldErrors, withPhysicsFieldErrorsAsync } from '../drying-paths/physics-range-error';
import { findFluidForSpread, findSpreadById, findSpreadsOfCheck, insertSpread, type PropertySpreadRow } from './property-spreads.repository';
import { spreadChunkSize } from './spread-chunk-size';
import { uncertaintiesFromFluid } from './spread-uncertainties';
import type { OpenSpreadCompute, SpreadCompute } from '../../jobs/spread-compute';
import { openInlineSpreadCompute } from '../../jobs/spread-compute-inline';
import { openThreadSpreadCompute } from '../../jobs/spread-compute-thread';

export { spreadRunResult } from './spread-run-result';

/** Inline runs above this many samples move to a worker thread when every sample needs the full solver. */
const SOLVER_INLINE_SAMPLES = 500;

/**
 * The compute for an inline run: this thread with the validated response surface (fast), or a
 * worker thread when the full solver is needed for many samples, so the request does not hold up others.
 */
async function openInlineRunCompute(plan: Parameters<OpenSpreadCompute>[0], layer: PhysicalLayer): Promise<SpreadCompute> {
  const here = openInlineSpreadCompute(plan, layer);
  if (here.evaluator.method === 'surrogate' || plan.samples <= SOLVER_INLINE_SAMPLES) return here;
  try {
    return await openThreadSpreadCompute(plan, layer);
  } catch {
    return here;
  }
}

/** Sends a queued spread to the job queue (absent when the queue is not running: a worker started later picks it up). */
export type EnqueueSpread = (spreadId: string) => Promise<void>;

/** Physics specs from the API's ± percent uncertainties. */
export function toSpreadSpecs(uncertainties: readonly SpreadUncertainty[]): SpreadPropertySpec[] {
  return uncertainties.map((u) => ({ name: u.name, relativeUncertainty: u.uncertaintyPercent / 100, distribution: u.distribution }));
}

/** JSON as stored: infinite numbers become null, as in the API answer. */
const jsonSafe = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

export function toPropertySpread(row: PropertySpreadRow): PropertySpread {
  return {
    id: row.id,
    checkId: row.checkId,
    revision: row.revision,
    status: row.status,
    samples: row.samples,
    seed: row.seed,
    progress: row.status === 'done' ? 1 : row.evaluatedSamples / row.samples,
    evaluatedSamples: row.evaluatedSamples,
    uncertainties: row.uncertainties as SpreadUncertainty[],
    result: (row.result as SpreadRunResult | null) ?? null,
    error: row.error,
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt ? row.finishedAt.toISOString() : null,
  };
}

/** The physical layer of a check revision (SI), or 422 naming the check's fields. */
async function layerOfCheck(db: DbOrTx, checkId: string) {
  const check = await findCheckAtRevision(db, checkId);
  const fluid = await findFluidForSpread(db, check.fluidId);
  if (!fluid) throw new UnprocessableError('The fluid of this check no longer exists.', { fluidId: 'the fluid of this check no longer exists' });
  const read = readLayerInput(check.input, fluid.laws);
  if (!read.ok) {
    const [path, message] = Object.entries(read.fields)[0];
    throw new UnprocessableError(`The saved check cannot be read: ${path}: ${message}`, read.fields);
  }
  return { check, fluid, layer: read.value.layer as PhysicalLayer };
}

/**
 * Starts a Property spread of a saved check's current revision. Up to INLINE_SPREAD_LIMIT samples
 * run now and are stored 'done'; larger runs are stored 'queued' with their frozen plan and sent to
 * the job queue. Without `uncertainties` the fluid library's stated ± % are used.
 */
export async function startPropertySpread(
  db: Database,
  user: CurrentUser,
  checkId: string,
  body: z.output<typeof runSpreadInputSchema>,
  options: { enqueue?: EnqueueSpread; requestId?: string; openCompute?: OpenSpreadCompute } = {},
): Promise<PropertySpread> {
  const { check, fluid, layer } = await layerOfCheck(db, checkId);
  let uncertainties = body.uncertainties;
  if (!uncertainties) {
    uncertainties = uncertaintiesFromFluid(fluid.definition).uncertainties;
    if (uncertainties.length === 0) {
      const message = `The fluid "${fluid.name}" states no uncertainty for any property: give uncertainties for this run or add them in the fluid library.`;
      throw new UnprocessableError(message, { uncertainties: message });
    }
  }
  const specs = toSpreadSpecs(uncertainties);
  const plan = withPhysicsFieldErrors(() => createLayerSpreadPlan(layer, specs, { samples: body.samples, seed: body.seed }));
  const inline = body.samples <= INLINE_SPREAD_LIMIT;

  let result: SpreadRunResult | null = null;
  let evaluator: unknown = null;
  if (inline) {
    const compute = await withPhysicsFieldErrorsAsync(() => (options.openCompute ?? openInlineRunCompute)(plan, layer));
    try {
      const chunk = await compute.runChunk(0, plan.samples);
      if (chunk.validCount === 0) {
        throw new UnprocessableError('No sample of this spread could be judged: every sample left the range the solver accepts.', { uncertainties: 'every sample was refused by the solver; lower the uncertainties' });
      }
      result = await compute.result(chunk);
      evaluator = compute.evaluator;
    } finally {
      await compute.close();
    }
  }

  const row = await db.transaction(async (tx) => {
    const saved = await insertSpread(tx, {
      checkId,
      revision: check.revision,
      status: inline ? 'done' : 'queued',
      samples: plan.samples,
      seed: plan.seed,
      chunkSize: inline ? plan.samples : spreadChunkSize(plan.samples),
      uncertainties,
      layer: jsonSafe(layer),
      plan: jsonSafe(plan),
      evaluator,
      evaluatedSamples: inline ? plan.samples : 0,
      result: result ? jsonSafe(result) : null,
      finishedAt: inline ? new Date() : null,
      createdBy: user.id,
    });
    await recordAuditEvent(tx, {
      actor: { id: user.id, email: user.email },
      action: inline ? 'property_spread.completed' : 'property_spread.queued',
      entityType: 'property_spread',
      entityId: saved.id,
      after: { checkId, revision: check.revision, samples: plan.samples, seed: plan.seed, uncertainties, onsetProbability: result?.onsetProbability ?? null },
      requestId: options.requestId,
    });
    return saved;
  });
  if (!inline && options.enqueue) await options.enqueue(row.id);
  return toPropertySpread(row);
}

/** One spread with its status and progress, or 404. */
export async function getPropertySpread(db: DbOrTx, id: string): Promise<PropertySpread> {
  const row = await findSpreadById(db, id);
  if (!row) throw new NotFoundError('There is no property spread with this id.');
  return toPropertySpread(row);
}

/** Spreads of a check, newest first (404 for an unknown check). */
export async function listPropertySpreads(db: DbOrTx, checkId: string): Promise<PropertySpread[]> {
  await findCheckAtRevision(db, checkId);
  return (await findSpreadsOfCheck(db, checkId)).map(toPropertySpread);
}

/**
 * The newest finished Property spread of a given revision of a check, or null (for the process
 * sheet: pass it to spreadSheetSection).
 */
export async function latestFinishedSpreadOfRevision(db: DbOrTx, checkId: string, revision: number): Promise<PropertySpread | null> {
  const row = (await findSpreadsOfCheck(db, checkId)).find((r) => r.revision === revision && r.status === 'done');
  return row ? toPropertySpread(row) : null;
}
