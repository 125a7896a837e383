import { z } from 'zod';
import { pageOf, pageQuerySchema } from './api-error';
import { layerEvaluationSchema, processKindSchema, quietWindowSchema } from './layer-checks';
import { roleSchema } from './roles';

/**
 * API contract of Process sheets: a numbered, revisioned record of a layer check, reviewed and
 * electronically signed by a QA reviewer.
 *
 * Workflow (server/features/sheets/sheet-workflow.ts): Draft → Awaiting review → Signed or Returned;
 * a Returned or Signed revision can be followed by a new revision (Draft); when a later revision is
 * signed, the earlier signed one becomes Superseded.
 */

export const sheetStateValues = ['draft', 'awaiting-review', 'returned', 'signed', 'superseded'] as const;
export const sheetStateSchema = z.enum(sheetStateValues);
export type SheetState = z.infer<typeof sheetStateSchema>;
export const sheetStateLabels: Readonly<Record<SheetState, string>> = Object.freeze({
  draft: 'Draft',
  'awaiting-review': 'Awaiting review',
  returned: 'Returned',
  signed: 'Signed',
  superseded: 'Superseded',
});

/** What a signature means (21 CFR 11.50(a)(3): review, approval, responsibility, authorship). */
export const signatureMeaningValues = ['approved-for-production', 'reviewed', 'approved-for-trial'] as const;
export const signatureMeaningSchema = z.enum(signatureMeaningValues, {
  error: `meaning must be one of ${signatureMeaningValues.join(', ')}`,
});
export type SignatureMeaning = z.infer<typeof signatureMeaningSchema>;
export const signatureMeaningLabels: Readonly<Record<SignatureMeaning, string>> = Object.freeze({
  'approved-for-production': 'Approved for production: the settings on this sheet may be run on the line',
  reviewed: 'Reviewed: the inputs, sources and results were checked; release is decided separately',
  'approved-for-trial': 'Approved for a trial run only, under engineering supervision',
});

// ---------------------------------------------------------------------------------------------
// Snapshot: everything a sheet shows, frozen when the revision is made
// ---------------------------------------------------------------------------------------------

/** One fluid property as entered, with its SI value, source and uncertainty. */
export const snapshotPropertySchema = z.object({
  key: z.string(),
  label: z.string(),
  /** As entered, with its unit ("12 cP"). */
  value: z.string(),
  si: z.number().nullable(),
  siUnit: z.string(),
  source: z.string(),
  uncertaintyPercent: z.number(),
});
export type SnapshotProperty = z.infer<typeof snapshotPropertySchema>;

/**
 * The Drying path saved with the check revision, as summarised for the sheet (SI). Optional: only
 * when an engineer saved a drying set-up for that revision.
 */
export const dryingPathSummarySchema = z.object({
  title: z.string(),
  verdictText: z.string(),
  /** Smallest thermal and solutal onset margins along the path; null = no onset possible. */
  minThermalMargin: z.number().nullable(),
  minSolutalMargin: z.number().nullable(),
  zones: z.array(
    z.object({
      zone: z.string(),
      /** [s] */ residenceTime: z.number(),
      /** [m] wet film thickness at zone exit */ thicknessOut: z.number(),
      /** [-] solids mass fraction at zone exit */ solidsOut: z.number(),
      /** [K] */ maxFilmTemperature: z.number(),
      /** [L/min] solvent evaporated in the zone, as liquid; null when not computed */ solventLitresPerMinute: z.number().nullable(),
      /** [-] share of the lower flammable limit in the exhaust; null when not computed */ lflFraction: z.number().nullable(),
    }),
  ),
});
export type DryingPathSummary = z.infer<typeof dryingPathSummarySchema>;

/** The newest finished Property spread of the check revision, summarised. Optional. */
export const propertySpreadSummarySchema = z.object({
  samples: z.number().int(),
  probabilityOfOnset: z.number(),
  marginP05: z.number().nullable(),
  marginP50: z.number().nullable(),
  marginP95: z.number().nullable(),
  /** Properties that move the margin most (margin swing over ± their uncertainty), largest first. */
  drivers: z.array(z.object({ property: z.string(), swing: z.number() })),
});
export type PropertySpreadSummary = z.infer<typeof propertySpreadSummarySchema>;

/** The quiet window without its margin grid: the boundaries the figure draws. */
export const snapshotWindowSchema = quietWindowSchema.omit({ margin: true });
export type SnapshotWindow = z.infer<typeof snapshotWindowSchema>;

export const sheetSnapshotSchema = z.object({
  /** Layout of this JSON; raise when it changes so old sheets still render. */
  format: z.literal(1),
  solverVersion: z.string(),
  site: z.object({ company: z.string(), name: z.string(), code: z.string() }),
  check: z.object({
    id: z.uuid(),
    title: z.string(),
    notes: z.string(),
    revision: z.number().int(),
    savedAt: z.string(),
    savedByName: z.string().nullable(),
    processKind: processKindSchema,
  }),
  /** The check's input as entered (quantities as text with units). */
  input: z.object({
    temperature: z.string(),
    depth: z.string(),
    bottom: z.object({ mechanics: z.string(), thermal: z.string() }),
    top: z.string(),
    deformableSurface: z.boolean(),
    heating: z.record(z.string(), z.string()),
    lateral: z.object({ deltaT: z.string(), distance: z.string() }).nullable(),
    panelWidth: z.string().nullable(),
    soluteFractionDifference: z.number().nullable(),
    alertThreshold: z.number(),
  }),
  fluid: z.object({
    id: z.uuid(),
    name: z.string(),
    kind: z.string(),
    referenceTemperature: z.string(),
    validRange: z.string().nullable(),
    properties: z.array(snapshotPropertySchema),
  }),
  results: layerEvaluationSchema,
  window: snapshotWindowSchema,
  dryingPath: dryingPathSummarySchema.optional(),
  propertySpread: propertySpreadSummarySchema.optional(),
});
export type SheetSnapshot = z.infer<typeof sheetSnapshotSchema>;

// ---------------------------------------------------------------------------------------------
// Requests
// ---------------------------------------------------------------------------------------------

const lineSchema = z
  .string({ error: 'line is required, e.g. "Line 2"' })
  .trim()
  .min(1, 'line is required, e.g. "Line 2"')
  .max(80, 'line must be at most 80 characters');
const purposeSchema = z
  .string({ error: 'purpose is required: say what the sheet releases' })
  .trim()
  .min(1, 'purpose is required: say what the sheet releases')
  .max(2000, 'purpose must be at most 2000 characters');

/** POST /api/sheets: a new sheet (revision 1, Draft) from a layer check's latest (or a given) revision. */
export const createSheetInputSchema = z.strictObject({
  checkId: z.uuid({ error: 'checkId must be the id of a layer check' }),
  /** Defaults to the check's latest revision. */
  checkRevision: z.number({ error: 'checkRevision must be a whole number' }).int().min(1, 'checkRevision must be ≥ 1').optional(),
  title: z.string().trim().min(1, 'title must not be empty').max(200, 'title must be at most 200 characters').optional(),
  line: lineSchema,
  purpose: purposeSchema,
});
export type CreateSheetInput = z.input<typeof createSheetInputSchema>;

/** POST /api/sheets/:id/revisions: a new Draft revision of a Returned or Signed sheet. */
export const reviseSheetInputSchema = z.strictObject({
  line: lineSchema.optional(),
  purpose: purposeSchema.optional(),
});
export type ReviseSheetInput = z.input<typeof reviseSheetInputSchema>;

export const returnSheetInputSchema = z.strictObject({
  comments: z
    .string({ error: 'comments are required: tell the author what to change' })
    .trim()
    .min(1, 'comments are required: tell the author what to change')
    .max(4000, 'comments must be at most 4000 characters'),
});
export type ReturnSheetInput = z.input<typeof returnSheetInputSchema>;

export const signSheetInputSchema = z.strictObject({
  password: z.string({ error: 'password is required to sign' }).min(1, 'password is required to sign').max(200),
  meaning: signatureMeaningSchema,
});
export type SignSheetInput = z.input<typeof signSheetInputSchema>;

export const sheetListQuerySchema = pageQuerySchema.extend({
  state: sheetStateSchema.optional(),
  line: z.string().trim().max(80, 'line must be at most 80 characters').optional(),
  authorId: z.uuid({ error: 'authorId must be a user id' }).optional(),
  q: z.string().trim().max(200, 'q must be at most 200 characters').optional(),
  /** Only the newest revision of each sheet (default true). */
  latest: z
    .enum(['true', 'false'], { error: 'latest must be true or false' })
    .transform((v) => v === 'true')
    .default(true),
});
export type SheetListQuery = z.input<typeof sheetListQuerySchema>;

// ---------------------------------------------------------------------------------------------
// Answers
// ---------------------------------------------------------------------------------------------

export const sheetSignatureSchema = z.object({
  signerId: z.uuid(),
  printedName: z.string(),
  role: roleSchema,
  meaning: signatureMeaningSchema,
  meaningText: z.string(),
  signedAt: z.string(),
  pdfSha256: z.string(),
});
export type SheetSignature = z.infer<typeof sheetSignatureSchema>;

export const sheetReturnSchema = z.object({
  reviewerId: z.uuid(),
  reviewerName: z.string(),
  comments: z.string(),
  returnedAt: z.string(),
});
export type SheetReturn = z.infer<typeof sheetReturnSchema>;

/** One row of the list (a revision of a sheet). */
export const sheetSummarySchema = z.object({
  id: z.uuid(),
  sheetId: z.uuid(),
  number: z.string(),
  revision: z.number().int(),
  state: sheetStateSchema,
  title: z.string(),
  line: z.string(),
  processKind: processKindSchema,
  authorId: z.uuid(),
  authorName: z.string(),
  createdAt: z.string(),
  /** Margin frozen in the snapshot; null = no onset possible. */
  margin: z.number().nullable(),
});
export type SheetSummary = z.infer<typeof sheetSummarySchema>;
export const sheetListSchema = pageOf(sheetSummarySchema);

export const sheetFiltersSchema = z.object({
  lines: z.array(z.string()),
  authors: z.array(z.object({ id: z.uuid(), name: z.string() })),
});
export type SheetFilters = z.infer<typeof sheetFiltersSchema>;

export const sheetAuditEntrySchema = z.object({
  id: z.number().int(),
  action: z.string(),
  actorEmail: z.string().nullable(),
  revisionId: z.string().nullable(),
  reason: z.string().nullable(),
  occurredAt: z.string(),
});
export type SheetAuditEntry = z.infer<typeof sheetAuditEntrySchema>;

/** What a person may do with this revision now (the server checks again). */
export const sheetActionValues = ['submit', 'return', 'sign', 'revise'] as const;
export const sheetActionSchema = z.enum(sheetActionValues);
export type SheetAction = z.infer<typeof sheetActionSchema>;

export const sheetDetailSchema = sheetSummarySchema.extend({
  purpose: z.string(),
  checkId: z.uuid(),
  checkRevision: z.number().int(),
  solverVersion: z.string(),
  submittedAt: z.string().nullable(),
  decidedAt: z.string().nullable(),
  pdfSha256: z.string().nullable(),
  signature: sheetSignatureSchema.nullable(),
  returns: z.array(sheetReturnSchema),
  /** The revision that superseded this one (Superseded only). */
  supersededBy: z.object({ id: z.uuid(), revision: z.number().int() }).nullable(),
  /** Every revision of this sheet, newest first. */
  revisions: z.array(sheetSummarySchema.pick({ id: true, revision: true, state: true, createdAt: true, authorName: true })),
  audit: z.array(sheetAuditEntrySchema),
  snapshot: sheetSnapshotSchema,
  /** Workflow actions open to the person asking. */
  allowedActions: z.array(sheetActionSchema),
});
export type SheetDetail = z.infer<typeof sheetDetailSchema>;

export const verifyResultSchema = z.discriminatedUnion('match', [
  z.object({
    match: z.literal(true),
    sha256: z.string(),
    sheetId: z.uuid(),
    revisionId: z.uuid(),
    number: z.string(),
    revision: z.number().int(),
    title: z.string(),
    state: sheetStateSchema,
    signature: sheetSignatureSchema,
  }),
  z.object({ match: z.literal(false), sha256: z.string() }),
]);
export type VerifyResult = z.infer<typeof verifyResultSchema>;
