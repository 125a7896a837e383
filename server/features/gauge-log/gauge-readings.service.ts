import Papa from 'papaparse';
import { randomUUID } from 'node:crypto';
import type { z } from 'zod';
import { escapeCsvCell } from '../../../shared/gauge/escape-csv-cell';
import { groupSpotsAndAreas } from '../../../shared/gauge/group-spots-and-areas';
import type { ReadReading } from '../../../shared/gauge/read-reading-rows';
import { readingFlag } from '../../../shared/gauge/reading-flag';
import {
  SERIES_LIMIT,
  type BatchSummary,
  type GaugeWindow,
  type JudgedReading,
  type ReadingSeries,
  type ReleasedCheck,
  type Reading,
  type RunSummary,
  type Spots,
  type spotsQuerySchema,
} from '../../../shared/schemas/gauge-log';
import { parseQuantity } from '../../../shared/units/parse-quantity';
import type { DbOrTx, Database } from '../../db/client';
import type { gaugeReadings } from '../../db/schema';
import { BadRequestError, NotFoundError, UnprocessableError } from '../../errors';
import { recordAuditEvent, type AuditActor } from '../audit/record-audit-event';
import { enqueueOverAlert } from './gauge-alert-mail';
import { judgeForRevision } from './gauge-judges';
import {
  countReadings,
  findBatchPage,
  findReadingPage,
  findReadingsInOrder,
  findReleasedPage,
  findRevisionContext,
  findRevisionStats,
  findRunSummaries,
  insertBatch,
  insertReadings,
  openOrAddToNote,
  type BatchRow,
  type ReadingColumns,
  type RevisionContext,
} from './gauge-log.repository';

const JUDGING_METHOD =
  'Each reading is judged with the signed sheet as released: the onset margin at the reading’s wet thickness is interpolated ' +
  'from 200 direct solves of the stability problem between a tenth and ten times the released thickness (within 0.01 % of a direct solve), ' +
  'with the fluid properties frozen at the sheet’s evaluation temperature. Substrate and air temperatures change the drive when the check gives a top heat-transfer coefficient.';

/** A revision that exists; `released` additionally requires it to be Signed (new readings go only there). */
export async function loadRevision(db: DbOrTx, revisionId: string, options: { released: boolean }): Promise<RevisionContext> {
  const context = await findRevisionContext(db, revisionId);
  if (!context || !['signed', 'superseded'].includes(context.state)) throw new NotFoundError('No signed process sheet revision has this id.');
  if (options.released && context.state !== 'signed') {
    throw new UnprocessableError(`${context.number} revision ${context.revision} is Superseded: post readings against the signed revision that replaced it.`);
  }
  return context;
}

function releasedFields(context: Pick<RevisionContext, 'revisionId' | 'sheetId' | 'number' | 'revision' | 'title' | 'line' | 'snapshot' | 'ownerName' | 'signedAt'>) {
  const s = context.snapshot;
  return {
    revisionId: context.revisionId,
    sheetId: context.sheetId,
    number: context.number,
    revision: context.revision,
    title: context.title,
    line: context.line,
    processKind: s.check.processKind,
    checkThickness: s.results.operatingPoint.depth,
    checkMargin: s.results.margin,
    alertThreshold: s.input.alertThreshold,
    ownerName: context.ownerName,
    signedAt: context.signedAt ? context.signedAt.toISOString() : null,
  };
}

/** Signed sheet revisions (released checks) with their reading counts. */
export async function listReleasedChecks(db: Database, query: { page: number; pageSize: number; line?: string; q?: string }) {
  const { rows, total } = await findReleasedPage(db, query);
  const items: ReleasedCheck[] = rows.map((row) => ({
    ...releasedFields(row),
    readingCount: row.readingCount ?? 0,
    overCount: row.overCount ?? 0,
    lastReadingAt: row.lastAt ? new Date(row.lastAt).toISOString() : null,
    openNotes: row.openNotes ?? 0,
  }));
  return { items, total, page: query.page, pageSize: query.pageSize };
}

/** One released check with its thickness window (limits and the margin curve). */
export async function getGaugeWindow(db: Database, revisionId: string): Promise<GaugeWindow> {
  const context = await loadRevision(db, revisionId, { released: false });
  const judge = judgeForRevision(revisionId, context.snapshot);
  const stats = await findRevisionStats(db, revisionId);
  return {
    ...releasedFields(context),
    readingCount: stats.readingCount,
    overCount: stats.overCount,
    lastReadingAt: stats.lastAt ? stats.lastAt.toISOString() : null,
    openNotes: stats.openNotes,
    quietLimits: judge.quietLimits,
    closeLimits: judge.closeLimits,
    curve: { thickness: [...judge.curve.thickness], margin: [...judge.curve.margin] },
    temperaturesUsable: judge.temperaturesUsable,
    method: JUDGING_METHOD,
  };
}

/** Judge readings with a revision's snapshot (no database work). */
export function judgeReadings(context: RevisionContext, readings: readonly ReadReading[]): JudgedReading[] {
  const judge = judgeForRevision(context.revisionId, context.snapshot);
  return readings.map((r) => {
    const margin = judge.margin(r.wetThickness, { substrateTemperature: r.substrateTemperature, airTemperature: r.airTemperature });
    return {
      line: r.line,
      run: r.run,
      position: r.position,
      measuredAt: r.measuredAt === null ? null : new Date(r.measuredAt).toISOString(),
      direction: r.direction,
      enteredThickness: r.enteredThickness,
      enteredUnit: r.enteredUnit,
      wetThickness: r.wetThickness,
      substrateTemperature: r.substrateTemperature,
      airTemperature: r.airTemperature,
      operator: r.operator,
      margin,
      flag: readingFlag(margin, judge.alertThreshold),
    };
  });
}

export function countFlags(judged: readonly Pick<JudgedReading, 'flag'>[]) {
  const counts = { quiet: 0, close: 0, over: 0 };
  for (const r of judged) counts[r.flag] += 1;
  return counts;
}

export interface BatchMeta {
  source: 'upload' | 'device';
  clientBatchId?: string;
  tokenId?: string | null;
  uploadedBy?: string | null;
  fileName?: string | null;
  gaugeType?: string | null;
  calibrationDate?: string | null;
  thicknessBasis: 'wet' | 'dry';
  volumeSolids?: number | null;
  thinner?: number | null;
  /** Operator for readings that name none. */
  defaultOperator?: string | null;
}

export function toBatchSummary(row: BatchRow, replayed = false): BatchSummary {
  return {
    id: row.id,
    revisionId: row.revisionId,
    clientBatchId: row.clientBatchId,
    source: row.source,
    fileName: row.fileName,
    gaugeType: row.gaugeType,
    calibrationDate: row.calibrationDate,
    thicknessBasis: row.thicknessBasis,
    readingCount: row.readingCount,
    quietCount: row.quietCount,
    closeCount: row.closeCount,
    overCount: row.overCount,
    worstMargin: row.worstMargin,
    createdAt: row.createdAt.toISOString(),
    replayed,
  };
}

/**
 * Judge and save one batch of readings, all or nothing, in one transaction: the batch row, every
 * reading (bulk insert), a nonconformance note per run with Over readings, the one alert e-mail
 * to the check's owner when there is any Over reading, and the audit event.
 */
export async function saveReadingBatch(
  db: Database,
  context: RevisionContext,
  readings: readonly ReadReading[],
  meta: BatchMeta,
  audit: { actor: AuditActor | null; requestId?: string; publicUrl: string },
): Promise<BatchRow> {
  if (readings.length === 0) throw new UnprocessableError('There are no readings to save.', { readings: 'at least one reading is needed' });
  const judge = judgeForRevision(context.revisionId, context.snapshot);
  const n = readings.length;
  const columns: ReadingColumns = {
    sequence: new Array(n),
    run: new Array(n),
    position: new Array(n),
    measuredAt: new Array(n),
    direction: new Array(n),
    enteredThickness: new Array(n),
    enteredUnit: new Array(n),
    wetThickness: new Array(n),
    substrateTemperature: new Array(n),
    airTemperature: new Array(n),
    operator: new Array(n),
    margin: new Array(n),
    flag: new Array(n),
  };
  const counts = { quiet: 0, close: 0, over: 0 };
  let worst: number | null = null;
  const overByRun = new Map<string, { overCount: number; worstMargin: number | null }>();
  for (let i = 0; i < n; i += 1) {
    const r = readings[i];
    const margin = judge.margin(r.wetThickness, { substrateTemperature: r.substrateTemperature, airTemperature: r.airTemperature });
    const flag = readingFlag(margin, judge.alertThreshold);
    counts[flag] += 1;
    if (margin !== null && (worst === null || margin < worst)) worst = margin;
    if (flag === 'over') {
      const run = overByRun.get(r.run) ?? { overCount: 0, worstMargin: null };
      run.overCount += 1;
      if (margin !== null && (run.worstMargin === null || margin < run.worstMargin)) run.worstMargin = margin;
      overByRun.set(r.run, run);
    }
    columns.sequence[i] = i + 1;
    columns.run[i] = r.run;
    columns.position[i] = r.position;
    columns.measuredAt[i] = r.measuredAt === null ? null : new Date(r.measuredAt).toISOString();
    columns.direction[i] = r.direction;
    columns.enteredThickness[i] = r.enteredThickness;
    columns.enteredUnit[i] = r.enteredUnit;
    columns.wetThickness[i] = r.wetThickness;
    columns.substrateTemperature[i] = r.substrateTemperature;
    columns.airTemperature[i] = r.airTemperature;
    columns.operator[i] = r.operator ?? meta.defaultOperator ?? null;
    columns.margin[i] = margin;
    columns.flag[i] = flag;
  }
  const clientBatchId = meta.clientBatchId ?? `upload-${randomUUID()}`;
  return db.transaction(async (tx) => {
    const batch = await insertBatch(tx, {
      revisionId: context.revisionId,
      source: meta.source,
      clientBatchId,
      tokenId: meta.tokenId ?? null,
      uploadedBy: meta.uploadedBy ?? null,
      fileName: meta.fileName ?? null,
      gaugeType: meta.gaugeType ?? null,
      calibrationDate: meta.calibrationDate ?? null,
      thicknessBasis: meta.thicknessBasis,
      volumeSolids: meta.volumeSolids ?? null,
      thinner: meta.thinner ?? null,
      readingCount: n,
      quietCount: counts.quiet,
      closeCount: counts.close,
      overCount: counts.over,
      worstMargin: worst,
    });
    await insertReadings(tx, batch.id, context.revisionId, meta.source, columns);
    const runs: { run: string; overCount: number; noteId: string }[] = [];
    for (const [run, stats] of overByRun) {
      const note = await openOrAddToNote(tx, { revisionId: context.revisionId, run, ownerId: context.ownerId, ...stats });
      runs.push({ run, overCount: stats.overCount, noteId: note.id });
    }
    if (counts.over > 0) {
      await enqueueOverAlert(tx, audit.publicUrl, context, {
        clientBatchId,
        source: meta.source,
        readingCount: n,
        quietCount: counts.quiet,
        closeCount: counts.close,
        overCount: counts.over,
        worstMargin: worst,
        runs,
      });
    }
    await recordAuditEvent(tx, {
      actor: audit.actor,
      action: 'gauge_batch.created',
      entityType: 'gauge_batch',
      entityId: batch.id,
      after: {
        revisionId: context.revisionId,
        sheet: `${context.number} rev ${context.revision}`,
        source: meta.source,
        clientBatchId,
        tokenId: meta.tokenId ?? null,
        fileName: meta.fileName ?? null,
        gaugeType: meta.gaugeType ?? null,
        calibrationDate: meta.calibrationDate ?? null,
        readings: n,
        ...counts,
        worstMargin: worst,
        notes: runs.map((r) => r.noteId),
      },
      requestId: audit.requestId ?? null,
    });
    return batch;
  });
}

type ReadingRow = typeof gaugeReadings.$inferSelect;
function toReading(row: ReadingRow): Reading {
  return {
    id: row.id,
    batchId: row.batchId,
    sequence: row.sequence,
    run: row.run,
    position: row.position,
    measuredAt: row.measuredAt ? row.measuredAt.toISOString() : null,
    direction: row.direction,
    enteredThickness: row.enteredThickness,
    enteredUnit: row.enteredUnit,
    wetThickness: row.wetThickness,
    substrateTemperature: row.substrateTemperature,
    airTemperature: row.airTemperature,
    operator: row.operator,
    source: row.source,
    margin: row.margin,
    flag: row.flag,
  };
}

export async function listReadings(db: Database, revisionId: string, query: { page: number; pageSize: number; flag?: string; run?: string }) {
  await loadRevision(db, revisionId, { released: false });
  const { rows, total } = await findReadingPage(db, revisionId, query);
  return { items: rows.map(toReading), total, page: query.page, pageSize: query.pageSize };
}

export async function listBatches(db: Database, revisionId: string, page: { page: number; pageSize: number }) {
  await loadRevision(db, revisionId, { released: false });
  const { rows, total } = await findBatchPage(db, revisionId, page);
  return { items: rows.map((r) => toBatchSummary(r)), total, page: page.page, pageSize: page.pageSize };
}

export async function listRunSummaries(db: Database, revisionId: string): Promise<{ items: RunSummary[] }> {
  await loadRevision(db, revisionId, { released: false });
  const rows = await findRunSummaries(db, revisionId);
  return {
    items: rows.map((r) => ({
      run: r.run,
      count: r.count,
      minThickness: r.minThickness,
      maxThickness: r.maxThickness,
      meanThickness: r.meanThickness,
      closeCount: r.closeCount,
      overCount: r.overCount,
      overShare: r.count === 0 ? 0 : r.overCount / r.count,
      worstMargin: r.worstMargin,
      firstAt: r.firstAt ? new Date(r.firstAt).toISOString() : null,
      lastAt: r.lastAt ? new Date(r.lastAt).toISOString() : null,
    })),
  };
}

/** Chart points: thickness against position (or time when readings carry no position). */
export async function getReadingSeries(db: Database, revisionId: string, run?: string): Promise<ReadingSeries> {
  await loadRevision(db, revisionId, { released: false });
  const rows = await findReadingsInOrder(db, revisionId, { run, limit: SERIES_LIMIT + 1 });
  const truncated = rows.length > SERIES_LIMIT;
  const shown = truncated ? rows.slice(rows.length - SERIES_LIMIT) : rows;
  const withPosition = shown.filter((r) => r.position !== null).length;
  const axis = withPosition >= shown.length / 2 || shown.length === 0 ? 'position' : 'time';
  const points = shown.filter((r) => (axis === 'position' ? r.position !== null : r.measuredAt !== null));
  return {
    axis,
    x: points.map((r) => (axis === 'position' ? (r.position as number) : (r.measuredAt as Date).getTime())),
    thickness: points.map((r) => r.wetThickness),
    flag: points.map((r) => r.flag),
    run: points.map((r) => r.run),
    truncated,
    total: truncated ? await countReadings(db, revisionId, run) : shown.length,
  };
}


/** SSPC-PA 2 spots and areas of one run, judged against a given range or the quiet window. */
export async function getSpots(db: Database, revisionId: string, query: z.output<typeof spotsQuerySchema>): Promise<Spots> {
  const context = await loadRevision(db, revisionId, { released: false });
  const judge = judgeForRevision(revisionId, context.snapshot);
  const read = (text: string | undefined, field: string): number | null => {
    if (text === undefined || text === '') return null;
    try {
      const value = parseQuantity(text, 'length');
      if (!(value > 0)) throw new Error('must be > 0');
      return value;
    } catch (error) {
      throw new BadRequestError('Some fields need attention.', { [field]: `${field}: ${(error as Error).message}` });
    }
  };
  const givenMin = read(query.specMin, 'specMin');
  const givenMax = read(query.specMax, 'specMax');
  const given = givenMin !== null || givenMax !== null;
  const spec = given ? { minimum: givenMin, maximum: givenMax } : { minimum: judge.quietLimits.lower, maximum: judge.quietLimits.upper };
  if (spec.minimum !== null && spec.maximum !== null && spec.minimum > spec.maximum) {
    throw new BadRequestError('Some fields need attention.', { specMin: 'specMin must not exceed specMax' });
  }
  const rows = await findReadingsInOrder(db, revisionId, { run: query.run, direction: query.direction });
  const grouping = groupSpotsAndAreas(
    rows.map((r) => ({ id: r.id, thickness: r.wetThickness })),
    spec,
    { readingsPerSpot: query.readingsPerSpot },
  );
  return {
    run: query.run,
    direction: query.direction ?? null,
    readingsPerSpot: query.readingsPerSpot,
    spec: { ...spec, source: given ? 'given' : 'quiet-window' },
    spotLimits: grouping.spotLimits,
    spots: grouping.spots.map((s) => {
      const margin = judge.margin(s.mean);
      return { ...s, readingIds: s.readingIds as number[], margin, flag: readingFlag(margin, judge.alertThreshold) };
    }),
    areas: grouping.areas.map((a) => ({ ...a, spotNumbers: [...a.spotNumbers] })),
    leftoverReadings: grouping.leftoverReadingIds.length,
  };
}

const EXPORT_COLUMNS = [
  'sheet',
  'revision',
  'run',
  'sequence',
  'position_m',
  'measured_at',
  'direction',
  'thickness_as_entered',
  'unit_as_entered',
  'wet_thickness_um',
  'substrate_temperature_c',
  'air_temperature_c',
  'operator',
  'source',
  'onset_margin',
  'flag',
];

/** Judged readings as CSV; every text cell is escaped against formula injection. */
export async function exportReadingsCsv(db: Database, revisionId: string, filter: { run?: string; flag?: string }): Promise<{ csv: string; fileName: string }> {
  const context = await loadRevision(db, revisionId, { released: false });
  const rows = await findReadingsInOrder(db, revisionId, filter);
  const text = (value: string | null) => (value === null ? '' : escapeCsvCell(value));
  const celsius = (kelvin: number | null) => (kelvin === null ? '' : Number((kelvin - 273.15).toFixed(6)));
  const data = rows.map((r) => [
    text(context.number),
    context.revision,
    text(r.run),
    r.sequence,
    r.position ?? '',
    r.measuredAt ? r.measuredAt.toISOString() : '',
    r.direction ? r.direction.toUpperCase() : '',
    r.enteredThickness,
    text(r.enteredUnit),
    Number((r.wetThickness * 1e6).toPrecision(12)),
    celsius(r.substrateTemperature),
    celsius(r.airTemperature),
    text(r.operator),
    r.source,
    r.margin === null ? '' : Number(r.margin.toPrecision(6)),
    r.flag === 'over' ? 'Over' : r.flag === 'close' ? 'Close' : 'Quiet',
  ]);
  const csv = Papa.unparse({ fields: EXPORT_COLUMNS, data }, { newline: '\r\n' });
  const safeNumber = context.number.replace(/[^\w.-]+/g, '_');
  return { csv, fileName: `quietlayer-gauge-${safeNumber}-rev${context.revision}.csv` };
}
