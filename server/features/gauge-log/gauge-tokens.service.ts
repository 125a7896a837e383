import type { Request } from 'express';
import type { z } from 'zod';
import { readReadingRows, type ThicknessBasis } from '../../../shared/gauge/read-reading-rows';
import type { BatchSummary, GaugeToken, IssuedGaugeToken, createGaugeTokenInputSchema, devicePostInputSchema } from '../../../shared/schemas/gauge-log';
import { createToken, hashToken } from '../../auth/tokens';
import type { CurrentUser } from '../../auth/current-user';
import type { Database } from '../../db/client';
import { BadRequestError, ForbiddenError, NotFoundError, UnauthenticatedError, UnprocessableError } from '../../errors';
import { recordAuditEvent } from '../audit/record-audit-event';
import {
  findBatchByClientId,
  findSignedRevisionOfSheet,
  findTokenByHash,
  findTokenById,
  insertToken,
  listTokens,
  revokeToken,
  touchToken,
  type TokenRow,
} from './gauge-log.repository';
import { loadRevision, saveReadingBatch, toBatchSummary } from './gauge-readings.service';

function toGaugeToken(row: TokenRow, sheetNumber: string, createdByName: string): GaugeToken {
  return {
    id: row.id,
    sheetId: row.sheetId,
    sheetNumber,
    line: row.line,
    label: row.label,
    tokenPrefix: row.tokenPrefix,
    createdByName,
    createdAt: row.createdAt.toISOString(),
    lastUsedAt: row.lastUsedAt ? row.lastUsedAt.toISOString() : null,
    revokedAt: row.revokedAt ? row.revokedAt.toISOString() : null,
  };
}

const TOKEN_PREFIX = 'qlg_';

/**
 * Issue a device token for a signed sheet's line. The token is returned once; only its SHA-256 is
 * stored. It lets a gauge post readings to that sheet (its signed revision at the time of each post).
 */
export async function issueGaugeToken(db: Database, user: CurrentUser, input: z.output<typeof createGaugeTokenInputSchema>, requestId: string): Promise<IssuedGaugeToken> {
  const context = await loadRevision(db, input.revisionId, { released: true });
  const { token: secret } = createToken();
  const token = `${TOKEN_PREFIX}${secret}`;
  return db.transaction(async (tx) => {
    const row = await insertToken(tx, {
      sheetId: context.sheetId,
      line: context.line,
      label: input.label,
      tokenHash: hashToken(token),
      tokenPrefix: token.slice(0, TOKEN_PREFIX.length + 6),
      createdBy: user.id,
    });
    await recordAuditEvent(tx, {
      actor: { id: user.id, email: user.email },
      action: 'gauge_token.issued',
      entityType: 'gauge_token',
      entityId: row.id,
      after: { sheetId: context.sheetId, sheet: context.number, line: context.line, label: input.label, tokenPrefix: row.tokenPrefix },
      requestId,
    });
    return { ...toGaugeToken(row, context.number, user.displayName), token };
  });
}

export async function listGaugeTokens(db: Database, revisionId?: string): Promise<{ items: GaugeToken[] }> {
  let sheetId: string | undefined;
  if (revisionId) sheetId = (await loadRevision(db, revisionId, { released: false })).sheetId;
  const rows = await listTokens(db, sheetId);
  return { items: rows.map((r) => toGaugeToken(r.token, r.sheetNumber, r.createdByName)) };
}

export async function revokeGaugeToken(db: Database, user: CurrentUser, id: string, requestId: string): Promise<void> {
  const existing = await findTokenById(db, id);
  if (!existing) throw new NotFoundError('No gauge token has this id.');
  await db.transaction(async (tx) => {
    const row = await revokeToken(tx, id, user.id);
    if (!row) return; // already revoked: revoking again changes nothing
    await recordAuditEvent(tx, {
      actor: { id: user.id, email: user.email },
      action: 'gauge_token.revoked',
      entityType: 'gauge_token',
      entityId: id,
      before: { revokedAt: null },
      after: { revokedAt: row.revokedAt?.toISOString() },
      requestId,
    });
  });
}

/** The token row for `Authorization: Bearer <token>`; 401 when missing, unknown or revoked. */
export async function authenticateGaugeToken(db: Database, req: Request): Promise<TokenRow> {
  const header = req.get('authorization') ?? '';
  const match = /^Bearer\s+(\S+)$/i.exec(header);
  if (!match) throw new UnauthenticatedError('Send the gauge token as "Authorization: Bearer <token>".');
  const row = await findTokenByHash(db, hashToken(match[1]));
  if (!row || row.revokedAt !== null) throw new UnauthenticatedError('This gauge token is unknown or has been revoked. Ask a process engineer for a new one.');
  return row;
}

const DEVICE_HEADERS = ['run', 'position', 'time', 'direction', 'thickness', 'substrateTemperature', 'airTemperature', 'operator'];

/**
 * Save a device's batch of readings. Idempotent by the client's batch id per token: a repeat returns
 * the first batch (replayed = true) and saves nothing again.
 */
export async function postDeviceReadings(
  db: Database,
  token: TokenRow,
  input: z.output<typeof devicePostInputSchema>,
  options: { requestId: string; publicUrl: string },
): Promise<{ status: 200 | 201; body: BatchSummary }> {
  if ((input.sheetId !== undefined && input.sheetId !== token.sheetId) || (input.line !== undefined && input.line !== token.line)) {
    throw new ForbiddenError(`This gauge token may post only to its own sheet and line (${token.line}).`);
  }
  const existing = await findBatchByClientId(db, token.id, input.batchId);
  if (existing) return { status: 200, body: toBatchSummary(existing, true) };

  const revisionId = await findSignedRevisionOfSheet(db, token.sheetId);
  if (!revisionId) throw new UnprocessableError('The sheet of this token has no signed revision now: readings cannot be judged.');
  const context = await loadRevision(db, revisionId, { released: true });

  const rows = input.readings.map((r) => [
    r.run,
    r.position === undefined ? '' : String(r.position),
    r.time ?? '',
    r.direction ?? '',
    String(r.thickness),
    r.substrateTemperature === undefined ? '' : String(r.substrateTemperature),
    r.airTemperature === undefined ? '' : String(r.airTemperature),
    r.operator ?? '',
  ]);
  const basis: ThicknessBasis =
    input.thicknessBasis === 'dry' ? { kind: 'dry', volumeSolids: (input.volumeSolidsPercent as number) / 100, thinner: input.thinnerPercent / 100 } : { kind: 'wet' };
  const columns = Object.fromEntries(DEVICE_HEADERS.map((h) => [h, h]));
  const read = readReadingRows(
    DEVICE_HEADERS,
    rows,
    { columns, units: { thickness: input.thicknessUnit, position: input.positionUnit, substrateTemperature: input.temperatureUnit, airTemperature: input.temperatureUnit } },
    basis,
  );
  const mappingFields: Record<string, string> = {};
  for (const [key, message] of Object.entries(read.mappingErrors)) {
    const unitField = key.startsWith('units.') ? key.slice(6) : key;
    const bodyField =
      unitField === 'thickness' ? 'thicknessUnit' : unitField === 'position' ? 'positionUnit' : unitField.endsWith('Temperature') ? 'temperatureUnit' : 'readings';
    mappingFields[bodyField] = message as string;
  }
  if (Object.keys(mappingFields).length > 0) throw new BadRequestError('Some fields need attention.', mappingFields);
  if (read.errors.length > 0) {
    const fields: Record<string, string> = {};
    for (const e of read.errors) fields[`readings.${e.line - 2}${e.column ? `.${e.column}` : ''}`] ??= e.message;
    throw new UnprocessableError(`${read.errorCount} reading${read.errorCount === 1 ? ' has' : 's have'} problems; nothing was saved.`, fields);
  }
  try {
    const batch = await saveReadingBatch(
      db,
      context,
      read.readings,
      {
        source: 'device',
        clientBatchId: input.batchId,
        tokenId: token.id,
        gaugeType: input.gaugeType ?? token.label,
        calibrationDate: input.calibrationDate ?? null,
        thicknessBasis: input.thicknessBasis,
        volumeSolids: input.volumeSolidsPercent === undefined ? null : input.volumeSolidsPercent / 100,
        thinner: input.thinnerPercent / 100,
        defaultOperator: `Gauge: ${token.label}`,
      },
      { actor: null, requestId: options.requestId, publicUrl: options.publicUrl },
    );
    await touchToken(db, token.id);
    return { status: 201, body: toBatchSummary(batch) };
  } catch (error) {
    // Two posts of the same batch at once: the second meets the unique index and answers like a retry.
    if ((error as { code?: string; cause?: { code?: string } }).code === '23505' || (error as { cause?: { code?: string } }).cause?.code === '23505') {
      const first = await findBatchByClientId(db, token.id, input.batchId);
      if (first) return { status: 200, body: toBatchSummary(first, true) };
    }
    throw error;
  }
}
