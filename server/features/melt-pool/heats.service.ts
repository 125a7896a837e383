import type { z } from 'zod';
import { massContentSchema, type Heat, type heatInputSchema, type heatListQuerySchema, type updateHeatInputSchema } from '../../../shared/schemas/melt-pool';
import type { CurrentUser } from '../../auth/current-user';
import type { Database, DbOrTx } from '../../db/client';
import { ConflictError, NotFoundError, UnprocessableError } from '../../errors';
import { recordAuditEvent } from '../audit/record-audit-event';
import { deleteHeat, findHeatById, findHeatByNumber, findHeatPage, insertHeat, updateHeatIfVersion, type HeatRow } from './heats.repository';

type HeatBody = z.output<typeof heatInputSchema>;

export function toHeat(row: HeatRow): Heat {
  return {
    id: row.id,
    heatNumber: row.heatNumber,
    supplier: row.supplier,
    product: row.product,
    sulfur: row.sulfurText,
    oxygen: row.oxygenText,
    sulfurWtPercent: row.sulfurWtPercent,
    oxygenWtPercent: row.oxygenWtPercent,
    sulfurPpm: row.sulfurWtPercent * 1e4,
    notes: row.notes,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** Reads sulfur and oxygen ("0.012 wt %", "120 ppm") to wt %, or 422 naming the field. */
function heatColumns(body: HeatBody) {
  const fields: Record<string, string> = {};
  const sulfur = massContentSchema('sulfur').safeParse(body.sulfur);
  if (!sulfur.success) fields.sulfur = sulfur.error.issues[0].message;
  let oxygen: number | null = null;
  if (body.oxygen) {
    const parsed = massContentSchema('oxygen').safeParse(body.oxygen);
    if (!parsed.success) fields.oxygen = parsed.error.issues[0].message;
    else oxygen = parsed.data;
  }
  if (Object.keys(fields).length > 0) {
    const [path, message] = Object.entries(fields)[0];
    throw new UnprocessableError(`Some values are not right: ${path}: ${message}`, fields);
  }
  return {
    heatNumber: body.heatNumber,
    supplier: body.supplier,
    product: body.product,
    sulfurWtPercent: sulfur.data as number,
    sulfurText: body.sulfur,
    oxygenWtPercent: oxygen,
    oxygenText: body.oxygen ? body.oxygen : null,
    notes: body.notes,
  };
}

const duplicate = (heatNumber: string) =>
  new ConflictError(`A heat numbered "${heatNumber}" is already in the register.`, { heatNumber: 'this heat number is already in the register' });

export async function listHeats(db: DbOrTx, query: z.output<typeof heatListQuerySchema>) {
  const { rows, total } = await findHeatPage(db, query);
  return { items: rows.map(toHeat), total };
}

export async function getHeat(db: DbOrTx, id: string): Promise<Heat> {
  const row = await findHeatById(db, id);
  if (!row) throw new NotFoundError('There is no heat with this id.');
  return toHeat(row);
}

/** Adds a heat (409 when the heat number is taken, case-insensitively). */
export async function createHeat(db: Database, user: CurrentUser, body: HeatBody, meta: { requestId?: string } = {}): Promise<Heat> {
  const columns = heatColumns(body);
  return db.transaction(async (tx) => {
    const row = await insertHeat(tx, { ...columns, createdBy: user.id });
    if (!row) throw duplicate(body.heatNumber);
    await recordAuditEvent(tx, { actor: { id: user.id, email: user.email }, action: 'heat.created', entityType: 'heat', entityId: row.id, after: toHeat(row), requestId: meta.requestId });
    return toHeat(row);
  });
}

/** Changes a heat; a stale `version` → 409 with the current heat's version in the message. */
export async function updateHeat(db: Database, user: CurrentUser, id: string, body: z.output<typeof updateHeatInputSchema>, meta: { requestId?: string } = {}): Promise<Heat> {
  const columns = heatColumns(body);
  return db.transaction(async (tx) => {
    const before = await findHeatById(tx, id);
    if (!before) throw new NotFoundError('There is no heat with this id.');
    const other = await findHeatByNumber(tx, body.heatNumber);
    if (other && other.id !== id) throw duplicate(body.heatNumber);
    const row = await updateHeatIfVersion(tx, id, body.version, columns);
    if (!row) throw new ConflictError(`This heat was changed by someone else (now version ${before.version}); reload it and try again.`, { version: 'stale version' });
    await recordAuditEvent(tx, { actor: { id: user.id, email: user.email }, action: 'heat.updated', entityType: 'heat', entityId: id, before: toHeat(before), after: toHeat(row), requestId: meta.requestId });
    return toHeat(row);
  });
}

/** Removes a heat that no melt-pool set-up uses (409 otherwise). */
export async function removeHeat(db: Database, user: CurrentUser, id: string, meta: { requestId?: string } = {}): Promise<void> {
  try {
    await db.transaction(async (tx) => {
      const row = await deleteHeat(tx, id);
      if (!row) throw new NotFoundError('There is no heat with this id.');
      await recordAuditEvent(tx, { actor: { id: user.id, email: user.email }, action: 'heat.deleted', entityType: 'heat', entityId: id, before: toHeat(row), requestId: meta.requestId });
    });
  } catch (error) {
    const code = (error as { code?: string; cause?: { code?: string } }).code ?? (error as { cause?: { code?: string } }).cause?.code;
    if (code === '23503') throw new ConflictError('This heat is linked to a melt-pool set-up and stays in the register.');
    throw error;
  }
}
