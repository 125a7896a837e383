import { z } from 'zod';
import { pageOf, pageQuerySchema } from './api-error';
import { processKindSchema } from './layer-checks';
import { roleSchema } from './roles';

/**
 * API contract of the Gauge log: thickness readings from the line judged against a signed process
 * sheet's frozen snapshot (the released check).
 *
 * Lengths travel in metres, temperatures in kelvin, times as ISO 8601 strings; the thickness as
 * entered keeps its number and unit. A margin that is infinite (no onset possible) is `null`.
 */

export const gaugeFlagValues = ['quiet', 'close', 'over'] as const;
export const gaugeFlagSchema = z.enum(gaugeFlagValues, { error: 'flag must be quiet, close or over' });
export type GaugeFlag = z.infer<typeof gaugeFlagSchema>;
export const gaugeFlagLabels: Readonly<Record<GaugeFlag, string>> = Object.freeze({ quiet: 'Quiet', close: 'Close', over: 'Over' });

export const gaugeSourceSchema = z.enum(['upload', 'device']);
export type GaugeSource = z.infer<typeof gaugeSourceSchema>;
export const gaugeDirectionSchema = z.enum(['md', 'cd']);
export type GaugeDirection = z.infer<typeof gaugeDirectionSchema>;

const uuidParam = (what: string) => z.uuid({ error: `${what} must be an id` });
export const revisionParamsSchema = z.object({ revisionId: uuidParam('revisionId') });
export const idParamsSchema = z.object({ id: uuidParam('id') });

// ---------------------------------------------------------------------------------------------
// Released checks
// ---------------------------------------------------------------------------------------------

export const thicknessLimitsSchema = z.object({
  /** Largest wet thickness at this level [m]; null when none within the table. */
  upper: z.number().nullable(),
  /** Smallest wet thickness (long-wave thinning below) [m]; null when none. */
  lower: z.number().nullable(),
});
export type ThicknessLimitsDto = z.infer<typeof thicknessLimitsSchema>;

/** A signed sheet revision that readings can be posted against. */
export const releasedCheckSchema = z.object({
  revisionId: z.uuid(),
  sheetId: z.uuid(),
  number: z.string(),
  revision: z.number().int(),
  title: z.string(),
  line: z.string(),
  processKind: processKindSchema,
  /** The check's wet thickness [m] as released. */
  checkThickness: z.number(),
  /** The released margin at that thickness; null = no onset. */
  checkMargin: z.number().nullable(),
  alertThreshold: z.number(),
  ownerName: z.string(),
  signedAt: z.string().nullable(),
  readingCount: z.number().int(),
  overCount: z.number().int(),
  lastReadingAt: z.string().nullable(),
  openNotes: z.number().int(),
});
export type ReleasedCheck = z.infer<typeof releasedCheckSchema>;
export const releasedCheckListSchema = pageOf(releasedCheckSchema);
export const releasedCheckListQuerySchema = pageQuerySchema.extend({
  line: z.string().trim().max(80, 'line must be at most 80 characters').optional(),
  q: z.string().trim().max(200, 'q must be at most 200 characters').optional(),
});

/** The released check with its thickness window, for the gauge pages and the chart. */
export const gaugeWindowSchema = releasedCheckSchema.extend({
  /** Margin 1 and the alert threshold as thickness limits [m]. */
  quietLimits: thicknessLimitsSchema,
  closeLimits: thicknessLimitsSchema,
  /** Margin against wet thickness at the released heating (the judging table). */
  curve: z.object({ thickness: z.array(z.number()), margin: z.array(z.number().nullable()) }),
  /** Whether substrate and air temperatures sent with readings change the drive. */
  temperaturesUsable: z.boolean(),
  /** Short sentence on how readings are judged. */
  method: z.string(),
});
export type GaugeWindow = z.infer<typeof gaugeWindowSchema>;

// ---------------------------------------------------------------------------------------------
// Upload
// ---------------------------------------------------------------------------------------------

export const readingColumnFieldValues = ['run', 'position', 'time', 'direction', 'thickness', 'substrateTemperature', 'airTemperature', 'operator'] as const;
export const readingUnitFieldValues = ['thickness', 'position', 'substrateTemperature', 'airTemperature'] as const;

const optionalText = (max: number, what: string) =>
  z
    .string()
    .trim()
    .max(max, `${what} must be at most ${max} characters`)
    .optional()
    .transform((v) => (v === '' ? undefined : v));

/** Wet readings, or dry readings converted through volume solids (percent) and thinner (percent by volume). */
const basisFields = {
  thicknessBasis: z.enum(['wet', 'dry'], { error: 'thicknessBasis must be wet or dry' }).default('wet'),
  volumeSolidsPercent: z.coerce
    .number({ error: 'volumeSolidsPercent must be a number' })
    .gt(0, 'volumeSolidsPercent must be > 0 %')
    .max(100, 'volumeSolidsPercent must be ≤ 100 %')
    .optional(),
  thinnerPercent: z.coerce
    .number({ error: 'thinnerPercent must be a number' })
    .min(0, 'thinnerPercent must be ≥ 0 %')
    .max(200, 'thinnerPercent must be ≤ 200 %')
    .default(0),
  gaugeType: optionalText(120, 'gaugeType'),
  calibrationDate: z
    .string()
    .trim()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'calibrationDate must be a date, YYYY-MM-DD')
    .optional()
    .or(z.literal('').transform(() => undefined)),
};

const requireSolidsForDry = <T extends { thicknessBasis: 'wet' | 'dry'; volumeSolidsPercent?: number }>(value: T, ctx: z.RefinementCtx) => {
  if (value.thicknessBasis === 'dry' && value.volumeSolidsPercent === undefined) {
    ctx.addIssue({ code: 'custom', path: ['volumeSolidsPercent'], message: 'volumeSolidsPercent is required to judge dry readings against the wet window' });
  }
};

/** The `options` form field of an upload (JSON text): column mapping, units, basis, gauge. */
export const uploadOptionsSchema = z
  .strictObject({
    columns: z.partialRecord(z.enum(readingColumnFieldValues), z.string().max(200)).default({}),
    units: z.partialRecord(z.enum(readingUnitFieldValues), z.string().trim().max(40)).default({}),
    /** Operator recorded on rows without an operator column (default: the person uploading). */
    operator: optionalText(120, 'operator'),
    ...basisFields,
  })
  .superRefine(requireSolidsForDry);
export type UploadOptions = z.input<typeof uploadOptionsSchema>;

export const rowErrorSchema = z.object({ line: z.number().int(), column: z.string().nullable(), message: z.string() });
export type RowErrorDto = z.infer<typeof rowErrorSchema>;

/** One reading as judged (preview rows and list rows). */
export const judgedReadingSchema = z.object({
  line: z.number().int().optional(),
  run: z.string(),
  /** [m] */ position: z.number().nullable(),
  measuredAt: z.string().nullable(),
  direction: gaugeDirectionSchema.nullable(),
  enteredThickness: z.number(),
  enteredUnit: z.string(),
  /** [m] */ wetThickness: z.number(),
  /** [K] */ substrateTemperature: z.number().nullable(),
  /** [K] */ airTemperature: z.number().nullable(),
  operator: z.string().nullable(),
  margin: z.number().nullable(),
  flag: gaugeFlagSchema,
});
export type JudgedReading = z.infer<typeof judgedReadingSchema>;

export const uploadPreviewSchema = z.object({
  /** File name for display only. */
  fileName: z.string(),
  headers: z.array(z.string()),
  /** The mapping detected from the headers (what the form starts with). */
  detected: z.object({ columns: z.record(z.string(), z.string()), units: z.record(z.string(), z.string()) }),
  /** The mapping used for this preview. */
  used: z.object({ columns: z.record(z.string(), z.string()), units: z.record(z.string(), z.string()) }),
  /** First rows of the file as text. */
  sampleRows: z.array(z.array(z.string())),
  rowCount: z.number().int(),
  validCount: z.number().int(),
  errorCount: z.number().int(),
  errors: z.array(rowErrorSchema),
  mappingErrors: z.record(z.string(), z.string()),
  /** The first readings judged. */
  judged: z.array(judgedReadingSchema),
  counts: z.object({ quiet: z.number().int(), close: z.number().int(), over: z.number().int() }),
});
export type UploadPreview = z.infer<typeof uploadPreviewSchema>;

export const batchSummarySchema = z.object({
  id: z.uuid(),
  revisionId: z.uuid(),
  clientBatchId: z.string(),
  source: gaugeSourceSchema,
  fileName: z.string().nullable(),
  gaugeType: z.string().nullable(),
  calibrationDate: z.string().nullable(),
  thicknessBasis: z.enum(['wet', 'dry']),
  readingCount: z.number().int(),
  quietCount: z.number().int(),
  closeCount: z.number().int(),
  overCount: z.number().int(),
  worstMargin: z.number().nullable(),
  createdAt: z.string(),
  /** True when a device post repeated an earlier batch id: the first result, nothing saved again. */
  replayed: z.boolean(),
});
export type BatchSummary = z.infer<typeof batchSummarySchema>;
export const batchListSchema = pageOf(batchSummarySchema);

// ---------------------------------------------------------------------------------------------
// Readings, runs, chart, spots
// ---------------------------------------------------------------------------------------------

export const readingSchema = judgedReadingSchema.omit({ line: true }).extend({
  id: z.number().int(),
  batchId: z.uuid(),
  sequence: z.number().int(),
  source: gaugeSourceSchema,
});
export type Reading = z.infer<typeof readingSchema>;
export const readingListSchema = pageOf(readingSchema);
export const readingListQuerySchema = pageQuerySchema.extend({
  flag: gaugeFlagSchema.optional(),
  run: z.string().trim().max(80, 'run must be at most 80 characters').optional(),
});
export type ReadingListQuery = z.input<typeof readingListQuerySchema>;

export const runSummarySchema = z.object({
  run: z.string(),
  count: z.number().int(),
  /** [m] */ minThickness: z.number(),
  /** [m] */ maxThickness: z.number(),
  /** [m] */ meanThickness: z.number(),
  closeCount: z.number().int(),
  overCount: z.number().int(),
  /** overCount / count, 0..1 */
  overShare: z.number(),
  worstMargin: z.number().nullable(),
  firstAt: z.string().nullable(),
  lastAt: z.string().nullable(),
});
export type RunSummary = z.infer<typeof runSummarySchema>;
export const runSummaryListSchema = z.object({ items: z.array(runSummarySchema) });

export const seriesQuerySchema = z.object({
  run: z.string().trim().max(80, 'run must be at most 80 characters').optional(),
});
/** Points for the chart: x is the position [m] when readings have one, else the time (ms since 1970). */
export const readingSeriesSchema = z.object({
  axis: z.enum(['position', 'time']),
  x: z.array(z.number()),
  thickness: z.array(z.number()),
  flag: z.array(gaugeFlagSchema),
  run: z.array(z.string()),
  /** True when more readings exist than the chart shows (the newest are kept). */
  truncated: z.boolean(),
  total: z.number().int(),
});
export type ReadingSeries = z.infer<typeof readingSeriesSchema>;
/** At most this many points go to the chart. */
export const SERIES_LIMIT = 20_000;

export const spotsQuerySchema = z.object({
  run: z.string({ error: 'run is required' }).trim().min(1, 'run is required').max(80),
  direction: gaugeDirectionSchema.optional(),
  readingsPerSpot: z.coerce.number().int().min(3, 'readingsPerSpot must be ≥ 3 (SSPC-PA 2)').max(20, 'readingsPerSpot must be ≤ 20').default(3),
  /** Specified range as text with units ("60 µm"); default: the quiet window's limits. */
  specMin: z.string().trim().max(40).optional(),
  specMax: z.string().trim().max(40).optional(),
});
export type SpotsQuery = z.input<typeof spotsQuerySchema>;

export const spotVerdictSchema = z.enum(['within', 'below', 'above']);
export const spotsSchema = z.object({
  run: z.string(),
  direction: gaugeDirectionSchema.nullable(),
  readingsPerSpot: z.number().int(),
  /** The range judged against [m] and where it came from. */
  spec: z.object({ minimum: z.number().nullable(), maximum: z.number().nullable(), source: z.enum(['quiet-window', 'given']) }),
  spotLimits: z.object({ minimum: z.number().nullable(), maximum: z.number().nullable() }),
  spots: z.array(
    z.object({
      number: z.number().int(),
      readingIds: z.array(z.number().int()),
      /** [m] */ mean: z.number(),
      min: z.number(),
      max: z.number(),
      verdict: spotVerdictSchema,
      /** Margin and flag of the spot mean. */
      margin: z.number().nullable(),
      flag: gaugeFlagSchema,
    }),
  ),
  areas: z.array(z.object({ number: z.number().int(), spotNumbers: z.array(z.number().int()), mean: z.number(), verdict: spotVerdictSchema, complete: z.boolean() })),
  leftoverReadings: z.number().int(),
});
export type Spots = z.infer<typeof spotsSchema>;

// ---------------------------------------------------------------------------------------------
// Device tokens and device posts
// ---------------------------------------------------------------------------------------------

export const createGaugeTokenInputSchema = z.strictObject({
  /** The signed revision whose sheet the token may post to (it follows later signed revisions of that sheet). */
  revisionId: uuidParam('revisionId'),
  label: z.string({ error: 'label is required' }).trim().min(1, 'label is required, e.g. "Line 2 inline gauge"').max(120, 'label must be at most 120 characters'),
});
export type CreateGaugeTokenInput = z.input<typeof createGaugeTokenInputSchema>;

export const gaugeTokenSchema = z.object({
  id: z.uuid(),
  sheetId: z.uuid(),
  sheetNumber: z.string(),
  line: z.string(),
  label: z.string(),
  tokenPrefix: z.string(),
  createdByName: z.string(),
  createdAt: z.string(),
  lastUsedAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
});
export type GaugeToken = z.infer<typeof gaugeTokenSchema>;
/** Answer to issuing a token: the only time the token itself is shown. */
export const issuedGaugeTokenSchema = gaugeTokenSchema.extend({ token: z.string() });
export type IssuedGaugeToken = z.infer<typeof issuedGaugeTokenSchema>;
export const gaugeTokenListSchema = z.object({ items: z.array(gaugeTokenSchema) });
export const gaugeTokenListQuerySchema = z.object({ revisionId: uuidParam('revisionId').optional() });

const deviceReadingSchema = z.strictObject({
  run: z.string({ error: 'run is required' }).trim().min(1, 'run is required').max(80, 'run must be at most 80 characters'),
  /** Position along the web in `positionUnit` (default m). */
  position: z.number({ error: 'position must be a number' }).finite().optional(),
  /** ISO 8601 with zone. */
  time: z.string().max(40).optional(),
  direction: z.enum(['MD', 'CD', 'md', 'cd'], { error: 'direction must be MD or CD' }).optional(),
  thickness: z.number({ error: 'thickness is required (a number in thicknessUnit)' }).finite(),
  substrateTemperature: z.number({ error: 'substrateTemperature must be a number' }).finite().optional(),
  airTemperature: z.number({ error: 'airTemperature must be a number' }).finite().optional(),
  operator: z.string().trim().max(120, 'operator must be at most 120 characters').optional(),
});

/** Most readings in one device post (the JSON body limit of 1 MB holds about this many). */
export const DEVICE_POST_LIMIT = 5_000;

/** Body of POST /api/gauge/readings (Authorization: Bearer <gauge token>). */
export const devicePostInputSchema = z
  .strictObject({
    /** Client-chosen id: a retried post with the same id returns the first result and saves nothing again. */
    batchId: z
      .string({ error: 'batchId is required' })
      .trim()
      .min(1, 'batchId is required')
      .max(100, 'batchId must be at most 100 characters')
      .regex(/^[\w.:-]+$/, 'batchId may use letters, digits and . _ : - only'),
    /** Optional: when given, must be the token's sheet and line (else 403). */
    sheetId: uuidParam('sheetId').optional(),
    line: z.string().trim().max(80).optional(),
    thicknessUnit: z.string().trim().max(40).default('µm'),
    positionUnit: z.string().trim().max(40).default('m'),
    temperatureUnit: z.string().trim().max(40).default('°C'),
    readings: z
      .array(deviceReadingSchema, { error: 'readings must be a list' })
      .min(1, 'readings must hold at least one reading')
      .max(DEVICE_POST_LIMIT, `readings must hold at most ${DEVICE_POST_LIMIT} readings per post`),
    ...basisFields,
  })
  .superRefine(requireSolidsForDry);
export type DevicePostInput = z.input<typeof devicePostInputSchema>;

// ---------------------------------------------------------------------------------------------
// Nonconformance notes
// ---------------------------------------------------------------------------------------------

export const noteStateValues = ['open', 'dispositioned', 'closed'] as const;
export const noteStateSchema = z.enum(noteStateValues);
export type NoteState = z.infer<typeof noteStateSchema>;
export const noteStateLabels: Readonly<Record<NoteState, string>> = Object.freeze({ open: 'Open', dispositioned: 'Dispositioned', closed: 'Closed' });

/** What the QA reviewer's closing signature means (21 CFR 11.50(a)(3)). */
export const noteMeaningValues = ['disposition-approved', 'reviewed-no-release'] as const;
export const noteMeaningSchema = z.enum(noteMeaningValues, { error: `meaning must be one of ${noteMeaningValues.join(', ')}` });
export type NoteMeaning = z.infer<typeof noteMeaningSchema>;
export const noteMeaningLabels: Readonly<Record<NoteMeaning, string>> = Object.freeze({
  'disposition-approved': 'Disposition approved: the run is handled as the disposition says',
  'reviewed-no-release': 'Reviewed: the disposition is recorded; the run is not released for use',
});

export const noteActionSchema = z.enum(['disposition', 'close']);
export const gaugeNoteSchema = z.object({
  id: z.uuid(),
  revisionId: z.uuid(),
  sheetNumber: z.string(),
  title: z.string(),
  line: z.string(),
  run: z.string(),
  state: noteStateSchema,
  ownerId: z.uuid(),
  ownerName: z.string(),
  openedAt: z.string(),
  overCount: z.number().int(),
  worstMargin: z.number().nullable(),
  disposition: z.string().nullable(),
  dispositionByName: z.string().nullable(),
  dispositionAt: z.string().nullable(),
  signature: z
    .object({ printedName: z.string(), role: roleSchema, meaning: noteMeaningSchema, meaningText: z.string(), signedAt: z.string() })
    .nullable(),
  allowedActions: z.array(noteActionSchema),
});
export type GaugeNote = z.infer<typeof gaugeNoteSchema>;
export const gaugeNoteListSchema = pageOf(gaugeNoteSchema);
export const gaugeNoteListQuerySchema = pageQuerySchema.extend({
  state: noteStateSchema.optional(),
  revisionId: uuidParam('revisionId').optional(),
});

export const dispositionInputSchema = z.strictObject({
  disposition: z
    .string({ error: 'disposition is required: say what happens to the run' })
    .trim()
    .min(1, 'disposition is required: say what happens to the run')
    .max(4000, 'disposition must be at most 4000 characters'),
});
export type DispositionInput = z.input<typeof dispositionInputSchema>;

export const closeNoteInputSchema = z.strictObject({
  password: z.string({ error: 'password is required to sign' }).min(1, 'password is required to sign').max(200),
  meaning: noteMeaningSchema,
});
export type CloseNoteInput = z.input<typeof closeNoteInputSchema>;
