import { z } from 'zod';
import { pageOf, pageQuerySchema } from './api-error';

/**
 * API contract of the fluid library.
 *
 * Every physical value travels as text with its unit, exactly as typed ("12 cP", "35 dyn/cm",
 * "68 °F"); the server reads it with shared/units `parseQuantity` and answers with the text as
 * entered plus the SI value. A unit that cannot be read or a value out of range is a 422 whose
 * `fields` key is the dotted path of the input, e.g. `viscosity.points.0.value`.
 */

export const fluidKindValues = ['solvent', 'solution', 'oil', 'molten-metal', 'other'] as const;
export const fluidKindSchema = z.enum(fluidKindValues);
export type FluidKind = z.infer<typeof fluidKindSchema>;
export const fluidKindLabels: Readonly<Record<FluidKind, string>> = Object.freeze({
  solvent: 'Solvent',
  solution: 'Solution',
  oil: 'Oil',
  'molten-metal': 'Molten metal',
  other: 'Other',
});

/** How the ± uncertainty of a property is spread for Property spread (Monte Carlo). */
export const distributionValues = ['normal', 'uniform'] as const;
export const distributionSchema = z.enum(distributionValues);
export type Distribution = z.infer<typeof distributionSchema>;

/** A quantity as typed: a number followed by a unit, e.g. "1.2 mPa·s". */
export const quantityTextSchema = z
  .string({ error: 'give a number and a unit, e.g. "12 cP"' })
  .trim()
  .min(1, 'give a number and a unit')
  .max(80, 'at most 80 characters');

const sourceTextSchema = z.string().trim().max(500, 'source must be at most 500 characters').default('');
const uncertaintySchema = z
  .number({ error: 'uncertaintyPercent must be a number' })
  .min(0, 'uncertaintyPercent must be ≥ 0 %')
  .max(100, 'uncertaintyPercent must be ≤ 100 %')
  .default(0);

/** One property as entered: value with unit, where it came from, and its ± % uncertainty. */
export const propertyInputSchema = z.strictObject({
  value: quantityTextSchema,
  source: sourceTextSchema,
  uncertaintyPercent: uncertaintySchema,
  distribution: distributionSchema.default('normal'),
});
export type PropertyInput = z.input<typeof propertyInputSchema>;

/** A stored property: the input plus the SI value and SI unit symbol. */
export const propertySchema = z.object({
  value: z.string(),
  source: z.string(),
  uncertaintyPercent: z.number(),
  distribution: distributionSchema,
  si: z.number(),
  siUnit: z.string(),
});
export type Property = z.infer<typeof propertySchema>;

/** One measured viscosity point; the value may be dynamic (cP, mPa·s) or kinematic (cSt, converted with ρ(T)). */
export const viscosityPointInputSchema = z.strictObject({
  temperature: quantityTextSchema,
  value: quantityTextSchema,
});

/**
 * Viscosity law. `points`: one point = constant viscosity; two or more are fitted to
 * μ = A·exp(B/T) by least squares in ln μ against 1/T. `andrade`: A [dynamic viscosity] and B [K] entered.
 */
export const viscosityLawInputSchema = z.discriminatedUnion('law', [
  z.strictObject({
    law: z.literal('points'),
    points: z
      .array(viscosityPointInputSchema)
      .min(1, 'give at least one viscosity point')
      .max(20, 'at most 20 viscosity points'),
    source: sourceTextSchema,
    uncertaintyPercent: uncertaintySchema,
    distribution: distributionSchema.default('normal'),
  }),
  z.strictObject({
    law: z.literal('andrade'),
    preExponential: quantityTextSchema,
    activationTemperature: quantityTextSchema,
    source: sourceTextSchema,
    uncertaintyPercent: uncertaintySchema,
    distribution: distributionSchema.default('normal'),
  }),
]);
export type ViscosityLawInput = z.input<typeof viscosityLawInputSchema>;

/** The stored viscosity law: as entered, plus the fitted μ = A exp(B/T) in SI. */
export const viscosityLawSchema = z.object({
  law: z.enum(['points', 'andrade']),
  points: z.array(z.object({ temperature: z.string(), value: z.string() })).optional(),
  preExponential: z.string().optional(),
  activationTemperature: z.string().optional(),
  source: z.string(),
  uncertaintyPercent: z.number(),
  distribution: distributionSchema,
  /** A [Pa·s] of μ = A·exp(B/T). */
  fitPreExponential: z.number(),
  /** B [K]; 0 for a constant viscosity. */
  fitActivationTemperature: z.number(),
  /** Root-mean-square relative misfit of the points [-]; 0 for one or two points or constants. */
  fitRmsRelativeError: z.number(),
});
export type ViscosityLaw = z.infer<typeof viscosityLawSchema>;

/**
 * What a fluid is made of (create, update, CSV row, or inline in an evaluation).
 * `heatCapacity` or `thermalDiffusivity` must be given (one is enough).
 * `soluteSurfaceTensionSlope` is dσ/dc in N/m per unit mass fraction of solvent (type e.g. "15 mN/m").
 */
export const fluidInputSchema = z.strictObject({
  name: z.string({ error: 'name is required' }).trim().min(1, 'name is required').max(120, 'name must be at most 120 characters'),
  kind: fluidKindSchema,
  notes: z.string().trim().max(4000, 'notes must be at most 4000 characters').default(''),
  referenceTemperature: quantityTextSchema,
  /** Temperature range the laws were stated for; outside it an evaluation warns. Both or neither. */
  validFrom: quantityTextSchema.optional(),
  validTo: quantityTextSchema.optional(),
  density: propertyInputSchema,
  expansion: propertyInputSchema,
  viscosity: viscosityLawInputSchema,
  surfaceTension: propertyInputSchema,
  surfaceTensionSlope: propertyInputSchema,
  conductivity: propertyInputSchema,
  heatCapacity: propertyInputSchema.optional(),
  thermalDiffusivity: propertyInputSchema.optional(),
  soluteDiffusivity: propertyInputSchema.optional(),
  soluteSurfaceTensionSlope: propertyInputSchema.optional(),
});
export type FluidInput = z.input<typeof fluidInputSchema>;
export type FluidInputParsed = z.output<typeof fluidInputSchema>;

/** Update = the whole fluid again plus the version you read (stale → 409 with the current fluid). */
export const updateFluidInputSchema = fluidInputSchema.extend({
  version: z.number({ error: 'version is required' }).int().min(1),
});
export type UpdateFluidInput = z.input<typeof updateFluidInputSchema>;

export const duplicateFluidInputSchema = z.strictObject({
  name: z.string().trim().min(1).max(120).optional(),
});
export const archiveFluidInputSchema = z.strictObject({
  version: z.number({ error: 'version is required' }).int().min(1),
});

/** A temperature as entered and in kelvin. */
export const temperatureValueSchema = z.object({ value: z.string(), si: z.number() });

/** A fluid as the API returns it. */
export const fluidSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  kind: fluidKindSchema,
  notes: z.string(),
  referenceTemperature: temperatureValueSchema,
  validFrom: temperatureValueSchema.nullable(),
  validTo: temperatureValueSchema.nullable(),
  density: propertySchema,
  expansion: propertySchema,
  viscosity: viscosityLawSchema,
  surfaceTension: propertySchema,
  surfaceTensionSlope: propertySchema,
  conductivity: propertySchema,
  heatCapacity: propertySchema.nullable(),
  thermalDiffusivity: propertySchema.nullable(),
  soluteDiffusivity: propertySchema.nullable(),
  soluteSurfaceTensionSlope: propertySchema.nullable(),
  archived: z.boolean(),
  /** Number of layer checks that use this fluid. */
  checkCount: z.number().int(),
  version: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Fluid = z.infer<typeof fluidSchema>;

/** One table row: SI values at the reference temperature. */
export const fluidSummarySchema = z.object({
  id: z.uuid(),
  name: z.string(),
  kind: fluidKindSchema,
  archived: z.boolean(),
  /** [K] */
  referenceTemperature: z.number(),
  /** [kg/m³] */
  density: z.number(),
  /** [Pa·s] at the reference temperature */
  viscosity: z.number(),
  /** [N/m] */
  surfaceTension: z.number(),
  /** [N/(m·K)] */
  surfaceTensionSlope: z.number(),
  version: z.number().int(),
  updatedAt: z.string(),
});
export type FluidSummary = z.infer<typeof fluidSummarySchema>;
export const fluidListSchema = pageOf(fluidSummarySchema);

export const fluidSortValues = ['name', 'kind', 'updatedAt', 'density', 'viscosity', 'surfaceTension'] as const;
export const fluidListQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(200, 'q must be at most 200 characters').optional(),
  kind: fluidKindSchema.optional(),
  /** 'true' lists archived fluids too; default only active ones. */
  includeArchived: z
    .enum(['true', 'false'], { error: "includeArchived must be 'true' or 'false'" })
    .default('false')
    .transform((v) => v === 'true'),
  sort: z.enum(fluidSortValues).default('name'),
  dir: z.enum(['asc', 'desc']).default('asc'),
});
export type FluidListQuery = z.input<typeof fluidListQuerySchema>;

/** CSV import: the file's text in JSON (the page reads the chosen file). */
export const fluidCsvImportInputSchema = z.strictObject({
  csv: z.string({ error: 'csv is required' }).min(1, 'the file is empty').max(900_000, 'the file is larger than 900 kB; split it'),
});
export const csvLineErrorSchema = z.object({
  /** 1-based line number in the file (the header is line 1). */
  line: z.number().int(),
  /** CSV column (or dotted input path) the problem concerns; '' when it is the whole line. */
  field: z.string(),
  message: z.string(),
});
export type CsvLineError = z.infer<typeof csvLineErrorSchema>;
export const fluidCsvPreviewSchema = z.object({
  columns: z.array(z.string()),
  rows: z.array(z.object({ line: z.number().int(), name: z.string(), kind: z.string(), valid: z.boolean() })),
  errors: z.array(csvLineErrorSchema),
  /** True when every row is valid, so commit will save them all. */
  ok: z.boolean(),
});
export type FluidCsvPreview = z.infer<typeof fluidCsvPreviewSchema>;
export const fluidCsvCommitResultSchema = z.object({
  created: z.number().int(),
  ids: z.array(z.uuid()),
});

/** The CSV columns, in order (export writes them, import reads them by header name). */
export const fluidCsvColumns = [
  'name',
  'kind',
  'reference_temperature',
  'valid_from',
  'valid_to',
  ...(['density', 'expansion', 'surface_tension', 'surface_tension_slope', 'conductivity', 'heat_capacity',
    'thermal_diffusivity', 'solute_diffusivity', 'solute_surface_tension_slope'] as const).flatMap((p) => [
    p,
    `${p}_source`,
    `${p}_uncertainty_pct`,
    `${p}_distribution`,
  ]),
  /** "20 °C = 1.002 mPa·s; 40 °C = 0.653 mPa·s" (points law) */
  'viscosity_points',
  /** Andrade constants instead of points: A (dynamic viscosity) and B (K) */
  'viscosity_a',
  'viscosity_b',
  'viscosity_source',
  'viscosity_uncertainty_pct',
  'viscosity_distribution',
  'notes',
] as const;
