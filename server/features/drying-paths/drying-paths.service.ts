import { computeDryingPath } from '../../../shared/physics/drying/compute-drying-path';
import type { DryingPathInput, DryingPathResult } from '../../../shared/physics/drying/types';
import { CLOSING_LINE, processCautions } from '../../../shared/fluids/process-cautions';
import type { DryingPathAnswer, DryingPathInputParsed, DryingPathSummary, DryingSetup } from '../../../shared/schemas/drying-paths';
import type { CurrentUser } from '../../auth/current-user';
import type { Database, DbOrTx } from '../../db/client';
import { NotFoundError } from '../../errors';
import { recordAuditEvent } from '../audit/record-audit-event';
import { findCheckAtRevision } from './check-revision';
import { summarizeDryingPath } from './drying-path-summary';
import { findDryingSetupById, findDryingSetupsOfCheck, insertDryingSetup, type DryingSetupRow } from './drying-paths.repository';
import { withPhysicsFieldErrors } from './physics-range-error';

/** Process kinds a Drying path belongs to. */
export const DRYING_KINDS = ['drying-coat', 'cast-film'] as const;

/** The validated API input as the physics core's DryingPathInput (the schema already read every unit to SI). */
export function toDryingPathInput(input: DryingPathInputParsed): DryingPathInput {
  return input as DryingPathInput;
}

/**
 * Runs the Drying path for a validated input; an input the physics refuses → 422 naming the field.
 * The answer carries the solvent-borne process cautions and the closing line (not a safety design tool).
 */
export function evaluateDryingPath(input: DryingPathInputParsed): DryingPathAnswer {
  const result: DryingPathResult = withPhysicsFieldErrors(() => computeDryingPath(toDryingPathInput(input)));
  return { ...result, cautions: processCautions('drying-coat'), closingLine: CLOSING_LINE };
}

function toDryingSetup(row: DryingSetupRow, createdByName: string | null): DryingSetup {
  return {
    id: row.id,
    checkId: row.checkId,
    revision: row.revision,
    title: row.title,
    input: row.input,
    summary: row.resultSummary as DryingPathSummary,
    createdAt: row.createdAt.toISOString(),
    createdByName,
  };
}

/**
 * Saves a drying set-up against the current revision of a drying-coat or cast-film check: the path
 * is computed first (a refused input writes nothing), then the set-up and its audit event commit together.
 */
export async function saveDryingSetup(
  db: Database,
  user: CurrentUser,
  checkId: string,
  body: { title: string; input: DryingPathInputParsed },
  meta: { requestId?: string } = {},
): Promise<DryingSetup> {
  const check = await findCheckAtRevision(db, checkId, DRYING_KINDS, 'A Drying path');
  const summary = summarizeDryingPath(withPhysicsFieldErrors(() => computeDryingPath(toDryingPathInput(body.input)), 'input'));
  const row = await db.transaction(async (tx) => {
    const saved = await insertDryingSetup(tx, {
      checkId,
      revision: check.revision,
      title: body.title,
      input: JSON.parse(JSON.stringify(body.input)),
      resultSummary: JSON.parse(JSON.stringify(summary)),
      createdBy: user.id,
    });
    await recordAuditEvent(tx, {
      actor: { id: user.id, email: user.email },
      action: 'drying_setup.created',
      entityType: 'drying_setup',
      entityId: saved.id,
      after: { checkId, revision: check.revision, title: body.title, verdict: summary.verdict },
      requestId: meta.requestId,
    });
    return saved;
  });
  return toDryingSetup(row, user.displayName);
}

/** Drying set-ups of a check, newest first (404 for an unknown check). */
export async function listDryingSetups(db: DbOrTx, checkId: string): Promise<DryingSetup[]> {
  await findCheckAtRevision(db, checkId);
  const rows = await findDryingSetupsOfCheck(db, checkId);
  return rows.map((r) => toDryingSetup(r.setup, r.createdByName));
}

/** One drying set-up, or 404. */
export async function getDryingSetup(db: DbOrTx, id: string): Promise<DryingSetup> {
  const row = await findDryingSetupById(db, id);
  if (!row) throw new NotFoundError('There is no drying set-up with this id.');
  return toDryingSetup(row.setup, row.createdByName);
}

/**
 * The newest drying set-up saved with a given revision of a check, or null (for the process sheet:
 * pass its summary to dryingSheetSection).
 */
export async function latestDryingSetupOfRevision(db: DbOrTx, checkId: string, revision: number): Promise<DryingSetup | null> {
  const rows = await findDryingSetupsOfCheck(db, checkId);
  const row = rows.find((r) => r.setup.revision === revision);
  return row ? toDryingSetup(row.setup, row.createdByName) : null;
}
