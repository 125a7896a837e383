import { and, desc, eq } from 'drizzle-orm';
import { compareJoinedPartSulfur } from '../../../shared/physics/melt-pool/compare-joined-part-sulfur';
import type { Heat, JoinedHeatsComparison, MeltPoolInputParsed, MeltPoolSetup, MeltPoolAnswer } from '../../../shared/schemas/melt-pool';
import type { CurrentUser } from '../../auth/current-user';
import type { Database, DbOrTx } from '../../db/client';
import { meltPoolSetups } from '../../db/schema/beyond-onset';
import { NotFoundError, UnprocessableError } from '../../errors';
import { recordAuditEvent } from '../audit/record-audit-event';
import { findCheckAtRevision } from '../drying-paths/check-revision';
import { withPhysicsFieldErrors } from '../drying-paths/physics-range-error';
import { findHeatById } from './heats.repository';
import { toHeat } from './heats.service';
import { evaluateMeltPool } from './melt-pool-answer';

/**
 * Compares the sulfur of the two heats being joined at the pool's mean surface temperature
 * (edge + peak)/2, the representative temperature the physics core's comparison asks for.
 */
export function compareHeats(first: Heat, second: Heat, input: MeltPoolInputParsed): JoinedHeatsComparison {
  const poolTemperature = (input.edgeTemperature + input.peakTemperature) / 2;
  const outcome = withPhysicsFieldErrors(() =>
    compareJoinedPartSulfur({
      first: { label: first.heatNumber, sulfurPpm: first.sulfurPpm, oxygenPpm: first.oxygenWtPercent === null ? undefined : first.oxygenWtPercent * 1e4 },
      second: { label: second.heatNumber, sulfurPpm: second.sulfurPpm, oxygenPpm: second.oxygenWtPercent === null ? undefined : second.oxygenWtPercent * 1e4 },
      poolTemperature,
    }),
  );
  const heatsInOrder = [first, second];
  return {
    poolTemperature,
    sulfurDifferencePpm: outcome.sulfurDifferencePpm,
    parts: outcome.parts.map((p, i) => ({
      heatId: heatsInOrder[i].id,
      heatNumber: p.label,
      sulfurPpm: p.sulfurPpm,
      bandPosition: p.bandPosition,
      surfaceTensionSlope: p.surfaceTensionSlope,
      flowDirection: p.flowDirection,
    })),
    warnings: outcome.warnings.map((w) => ({ code: w.code, message: w.message })),
    notes: [...outcome.notes],
  };
}

async function heatOrThrow(db: DbOrTx, id: string, field: string): Promise<Heat> {
  const row = await findHeatById(db, id);
  if (!row) throw new UnprocessableError(`There is no heat with this id (${field}).`, { [field]: 'there is no heat with this id' });
  return toHeat(row);
}

/**
 * Saves a melt-pool set-up against the current revision of a melt-pool check: the pool input and
 * the two heats being joined, with the flow result and the sulfur comparison (warnings when the
 * joined parts' sulfur moves the flow direction).
 */
export async function saveMeltPoolSetup(
  db: Database,
  user: CurrentUser,
  checkId: string,
  body: { input: MeltPoolInputParsed; firstHeatId: string; secondHeatId: string },
  meta: { requestId?: string } = {},
): Promise<MeltPoolSetup> {
  const check = await findCheckAtRevision(db, checkId, ['melt-pool'], 'A melt-pool set-up');
  if (body.firstHeatId === body.secondHeatId) {
    throw new UnprocessableError('Choose two different heats to join.', { secondHeatId: 'choose a heat other than the first' });
  }
  const first = await heatOrThrow(db, body.firstHeatId, 'firstHeatId');
  const second = await heatOrThrow(db, body.secondHeatId, 'secondHeatId');
  const result = evaluateMeltPool(body.input);
  const comparison = compareHeats(first, second, body.input);
  const row = await db.transaction(async (tx) => {
    const [saved] = await tx
      .insert(meltPoolSetups)
      .values({
        checkId,
        revision: check.revision,
        input: JSON.parse(JSON.stringify(body.input)),
        firstHeatId: first.id,
        secondHeatId: second.id,
        resultSummary: JSON.parse(JSON.stringify({ result, comparison })),
        createdBy: user.id,
      })
      .returning();
    await recordAuditEvent(tx, {
      actor: { id: user.id, email: user.email },
      action: 'melt_pool_setup.created',
      entityType: 'melt_pool_setup',
      entityId: saved.id,
      after: { checkId, revision: check.revision, firstHeat: first.heatNumber, secondHeat: second.heatNumber, direction: result.direction, warnings: comparison.warnings.map((w) => w.code) },
      requestId: meta.requestId,
    });
    return saved;
  });
  return { id: row.id, checkId, revision: row.revision, input: row.input, firstHeat: first, secondHeat: second, result, comparison, createdAt: row.createdAt.toISOString() };
}

async function toSetup(db: DbOrTx, row: typeof meltPoolSetups.$inferSelect): Promise<MeltPoolSetup> {
  const stored = row.resultSummary as { result: MeltPoolAnswer; comparison: JoinedHeatsComparison };
  const first = row.firstHeatId ? await findHeatById(db, row.firstHeatId) : undefined;
  const second = row.secondHeatId ? await findHeatById(db, row.secondHeatId) : undefined;
  if (!first || !second) throw new NotFoundError('A heat of this set-up is missing.');
  return { id: row.id, checkId: row.checkId, revision: row.revision, input: row.input, firstHeat: toHeat(first), secondHeat: toHeat(second), result: stored.result, comparison: stored.comparison, createdAt: row.createdAt.toISOString() };
}

/** Melt-pool set-ups of a check, newest first. */
export async function listMeltPoolSetups(db: DbOrTx, checkId: string): Promise<MeltPoolSetup[]> {
  await findCheckAtRevision(db, checkId);
  const rows = await db.select().from(meltPoolSetups).where(eq(meltPoolSetups.checkId, checkId)).orderBy(desc(meltPoolSetups.createdAt)).limit(100);
  return Promise.all(rows.map((r) => toSetup(db, r)));
}

/** The newest melt-pool set-up of a given revision of a check, or null (for the process sheet: meltPoolSheetSection). */
export async function latestMeltPoolSetupOfRevision(db: DbOrTx, checkId: string, revision: number): Promise<MeltPoolSetup | null> {
  const [row] = await db
    .select()
    .from(meltPoolSetups)
    .where(and(eq(meltPoolSetups.checkId, checkId), eq(meltPoolSetups.revision, revision)))
    .orderBy(desc(meltPoolSetups.createdAt))
    .limit(1);
  return row ? toSetup(db, row) : null;
}

export { evaluateMeltPool };
