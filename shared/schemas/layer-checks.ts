import { z } from 'zod';
import { pageOf, pageQuerySchema } from './api-error';
import { fluidInputSchema, quantityTextSchema } from './fluids';

/**
 * API contract of layer checks, their live evaluation and the quiet window.
 *
 * Quantities travel as text with units ("50 µm", "5 K", "9 °F" as a difference, "120 °C",
 * "25 W/(m²·K)"); the server converts them to SI. Answers are in SI (m, K, Pa·s, W/m², m/s);
 * the client formats them in the user's units. A number that is infinite in the physics (no onset
 * possible, no limit) is sent as `null`.
 */

export const processKindValues = ['drying-coat', 'cast-film', 'melt-pool', 'general-layer'] as const;
export const processKindSchema = z.enum(processKindValues);
export type ProcessKind = z.infer<typeof processKindSchema>;
export const processKindLabels: Readonly<Record<ProcessKind, string>> = Object.freeze({
  'drying-coat': 'Drying coat',
  'cast-film': 'Cast film',
  'melt-pool': 'Melt pool',
  'general-layer': 'General layer',
});

export const bottomSchema = z.strictObject({
  mechanics: z.enum(['rigid', 'free']),
  thermal: z.enum(['conducting', 'insulating']),
});
/** 'surface' = free surface with surface-tension stress; 'rigid' = lid; 'free' = flat stress-free top. */
export const topKindSchema = z.enum(['surface', 'rigid', 'free']);
export type TopKindInput = z.infer<typeof topKindSchema>;

/**
 * How heat is applied.
 * - `deltaT`: temperature drop bottom → surface (a difference: "5 K", "9 °F").
 * - `substrate-air`: plate and air temperatures with a top heat-transfer coefficient h;
 *   ΔT = (T_b − T_a)·Bi/(1 + Bi), Bi = h d / k.
 * - `heat-flux`: q through the layer, ΔT = q d / k; optional h for the top Biot number.
 * - `evaporation`: evaporation rate ṁ and latent heat L; q = ṁ L taken from the surface, ΔT = q d / k.
 */
export const heatingInputSchema = z.discriminatedUnion('mode', [
  z.strictObject({ mode: z.literal('deltaT'), deltaT: quantityTextSchema, heatTransferCoefficient: quantityTextSchema.optional() }),
  z.strictObject({
    mode: z.literal('substrate-air'),
    substrateTemperature: quantityTextSchema,
    airTemperature: quantityTextSchema,
    heatTransferCoefficient: quantityTextSchema,
  }),
  z.strictObject({ mode: z.literal('heat-flux'), heatFlux: quantityTextSchema, heatTransferCoefficient: quantityTextSchema.optional() }),
  z.strictObject({
    mode: z.literal('evaporation'),
    evaporationRate: quantityTextSchema,
    latentHeat: quantityTextSchema,
    heatTransferCoefficient: quantityTextSchema.optional(),
  }),
]);
export type HeatingInput = z.input<typeof heatingInputSchema>;
export type HeatingMode = HeatingInput['mode'];

/** A temperature difference along the layer over a distance (drives flow toward the cooler/higher-σ side). */
export const lateralInputSchema = z.strictObject({
  deltaT: quantityTextSchema,
  distance: quantityTextSchema,
});

const layerFields = {
  processKind: processKindSchema,
  /** Evaluation temperature of the liquid (absolute: "60 °C"). */
  temperature: quantityTextSchema,
  depth: quantityTextSchema,
  bottom: bottomSchema,
  top: topKindSchema,
  /** A free surface may deform (long-wave thinning); false treats it as flat. Only for top 'surface'. */
  deformableSurface: z.boolean().default(true),
  heating: heatingInputSchema,
  lateral: lateralInputSchema.nullable().optional(),
  panelWidth: quantityTextSchema.nullable().optional(),
  /** Solvent mass-fraction difference across the layer, 0..1, for the solutal Marangoni number. */
  soluteFractionDifference: z
    .number({ error: 'soluteFractionDifference must be a number' })
    .min(0, 'soluteFractionDifference must be ≥ 0')
    .max(1, 'soluteFractionDifference must be ≤ 1')
    .nullable()
    .optional(),
  /** Margin below which the check is "close" (amber); default 1.25. */
  alertThreshold: z
    .number({ error: 'alertThreshold must be a number' })
    .min(1, 'alertThreshold must be ≥ 1')
    .max(10, 'alertThreshold must be ≤ 10')
    .default(1.25),
};

/** Body of create (and, with `version`, update). */
export const layerCheckInputSchema = z.strictObject({
  title: z.string({ error: 'title is required' }).trim().min(1, 'title is required').max(200, 'title must be at most 200 characters'),
  fluidId: z.uuid({ error: 'fluidId must be the id of a fluid' }),
  notes: z.string().trim().max(4000, 'notes must be at most 4000 characters').default(''),
  ...layerFields,
});
export type LayerCheckInput = z.input<typeof layerCheckInputSchema>;
export type LayerCheckInputParsed = z.output<typeof layerCheckInputSchema>;

export const updateLayerCheckInputSchema = layerCheckInputSchema.extend({
  version: z.number({ error: 'version is required' }).int().min(1),
});
export type UpdateLayerCheckInput = z.input<typeof updateLayerCheckInputSchema>;

/**
 * Body of POST /api/layer-checks/evaluate and /window: the same as a check; `title`, `notes` optional;
 * the fluid either by `fluidId` or inline as `fluid` (exactly one).
 */
export const evaluateLayerCheckInputSchema = z
  .strictObject({
    title: z.string().max(200).optional(),
    notes: z.string().max(4000).optional(),
    fluidId: z.uuid({ error: 'fluidId must be the id of a fluid' }).optional(),
    fluid: fluidInputSchema.extend({ name: z.string().trim().max(120).default('Inline fluid') }).optional(),
    ...layerFields,
  })
  .refine((v) => (v.fluidId === undefined) !== (v.fluid === undefined), {
    message: 'give either fluidId or an inline fluid, not both',
    path: ['fluidId'],
  });
export type EvaluateLayerCheckInput = z.input<typeof evaluateLayerCheckInputSchema>;

/** A stored layer check. Quantities are returned as entered. */
export const layerCheckSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  notes: z.string(),
  fluidId: z.uuid(),
  fluidName: z.string(),
  fluidArchived: z.boolean(),
  processKind: processKindSchema,
  temperature: z.string(),
  depth: z.string(),
  bottom: bottomSchema,
  top: topKindSchema,
  deformableSurface: z.boolean(),
  heating: heatingInputSchema,
  lateral: lateralInputSchema.nullable(),
  panelWidth: z.string().nullable(),
  soluteFractionDifference: z.number().nullable(),
  alertThreshold: z.number(),
  ownerId: z.uuid().nullable(),
  ownerName: z.string().nullable(),
  revision: z.number().int(),
  version: z.number().int(),
  /** Margin and regime computed when the check was last saved (null margin = no onset possible). */
  savedMargin: z.number().nullable(),
  savedRegime: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type LayerCheck = z.infer<typeof layerCheckSchema>;

export const layerCheckSummarySchema = z.object({
  id: z.uuid(),
  title: z.string(),
  processKind: processKindSchema,
  fluidId: z.uuid(),
  fluidName: z.string(),
  depth: z.string(),
  /** [m] */
  depthSi: z.number(),
  ownerName: z.string().nullable(),
  revision: z.number().int(),
  savedMargin: z.number().nullable(),
  savedRegime: z.string().nullable(),
  updatedAt: z.string(),
});
export type LayerCheckSummary = z.infer<typeof layerCheckSummarySchema>;
export const layerCheckListSchema = pageOf(layerCheckSummarySchema);

export const layerCheckSortValues = ['title', 'processKind', 'updatedAt', 'depth', 'margin'] as const;
export const layerCheckListQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(200, 'q must be at most 200 characters').optional(),
  processKind: processKindSchema.optional(),
  fluidId: z.uuid().optional(),
  /** Only the checks this person owns (the client sends its own id for "Mine only"). */
  ownerId: z.uuid({ error: 'ownerId must be a user id' }).optional(),
  sort: z.enum(layerCheckSortValues).default('updatedAt'),
  dir: z.enum(['asc', 'desc']).default('desc'),
});
export type LayerCheckListQuery = z.input<typeof layerCheckListQuerySchema>;

export const layerCheckRevisionSchema = z.object({
  revision: z.number().int(),
  savedAt: z.string(),
  savedById: z.uuid().nullable(),
  savedByName: z.string().nullable(),
  /** The full check input of that revision. */
  input: z.unknown(),
});
export type LayerCheckRevision = z.infer<typeof layerCheckRevisionSchema>;
export const layerCheckRevisionListSchema = z.object({ items: z.array(layerCheckRevisionSchema) });

// ---------------------------------------------------------------------------------------------
// Evaluation result
// ---------------------------------------------------------------------------------------------

export const regimeValues = ['quiet', 'surface-tension-cells', 'buoyancy-cells', 'mixed-cells', 'long-wave-thinning'] as const;
export const marginStatusValues = ['quiet', 'close', 'over'] as const;
/** Teal/amber/crimson with a word: quiet ≥ threshold, close 1…threshold, over < 1. */
export const marginStatusSchema = z.enum(marginStatusValues);
export type MarginStatus = z.infer<typeof marginStatusSchema>;

const nullableNumber = z.number().nullable();

export const evaluationWarningSchema = z.object({
  code: z.enum([
    'surface-may-deform',
    'thicker-than-capillary-length',
    'temperature-outside-range',
    'solutal-needs-concentration',
    'solutal-dominates',
    'heated-from-above',
    'fluid-archived',
  ]),
  message: z.string(),
});
export type EvaluationWarning = z.infer<typeof evaluationWarningSchema>;

export const defectSchema = z.object({
  /** Trade name, e.g. "Bénard cells / floating". */
  name: z.string(),
  description: z.string(),
});
export const leverSchema = z.object({
  lever: z.enum(['wet-thickness', 'temperature-difference', 'viscosity']),
  direction: z.enum(['decrease', 'increase', 'hold']),
  /** Multiply the present value by this to reach the alert threshold (null when this lever cannot reach it). */
  factor: nullableNumber,
  /** The present value [SI: m, K, Pa·s]. */
  present: z.number(),
  /** The value that reaches the alert threshold [SI]; null when unreachable. */
  target: nullableNumber,
  text: z.string(),
});
export type Lever = z.infer<typeof leverSchema>;

export const layerEvaluationSchema = z.object({
  /** Inputs and derived drive in SI. */
  operatingPoint: z.object({
    /** [m] */ depth: z.number(),
    /** [K] */ temperature: z.number(),
    /** [K] temperature drop bottom → surface in the conduction state */ deltaT: z.number(),
    /** [W/m²] heat flux through the layer, when heat is given as a flux or evaporation load */ heatFlux: nullableNumber,
    /** [W/(m²·K)] */ heatTransferCoefficient: nullableNumber,
  }),
  /** Fluid properties at the evaluation temperature [SI]. */
  properties: z.object({
    density: z.number(),
    viscosity: z.number(),
    kinematicViscosity: z.number(),
    surfaceTension: z.number(),
    surfaceTensionSlope: z.number(),
    conductivity: z.number(),
    heatCapacity: z.number(),
    thermalDiffusivity: z.number(),
    expansion: z.number(),
    soluteDiffusivity: nullableNumber,
    soluteSurfaceTensionSlope: nullableNumber,
  }),
  groups: z.object({
    rayleigh: z.number(),
    marangoni: z.number(),
    biot: nullableNumber,
    prandtl: z.number(),
    bond: z.number(),
    dynamicBond: nullableNumber,
    crispation: z.number(),
    galileo: z.number(),
    solutalMarangoni: nullableNumber,
    /** √(σ/(ρg)) [m] */
    capillaryLength: z.number(),
  }),
  critical: z.object({
    /** Onset Ra and Ma along the operating ray (λ*·Ra, λ*·Ma); null when no onset. */
    rayleigh: nullableNumber,
    marangoni: nullableNumber,
    /** Critical Ra with no thermocapillarity, critical Ma with no buoyancy (same boundaries). */
    rayleighAlone: nullableNumber,
    marangoniAlone: nullableNumber,
    /** [1/d]; 0 for a long-wave mode. */
    wavenumber: nullableNumber,
  }),
  margin: nullableNumber,
  status: marginStatusSchema,
  alertThreshold: z.number(),
  regime: z.enum(regimeValues),
  regimeLabel: z.string(),
  /** What would set in at onset even while quiet. */
  mechanism: z.string(),
  mechanismLabel: z.string(),
  /** Plain words by depth, e.g. "At 50 µm buoyancy is negligible; surface tension drives the cells." */
  mechanismSentence: z.string(),
  /** Share of the drive from buoyancy at onset, 0..1. */
  buoyancyShare: nullableNumber,
  cells: z.object({
    /** 2πd/k_c [m] */ wavelength: nullableNumber,
    /** centre-to-centre spacing of hexagons, 4πd/(√3 k_c) [m] */ hexagonSpacing: nullableNumber,
    /** panel width / wavelength */ acrossPanel: nullableNumber,
  }),
  sizing: z.object({
    /** Largest quiet depth at this heating [m]; null = no limit. */
    maxStableDepth: nullableNumber,
    /** Smallest quiet depth (long-wave thinning below it) [m]; null = none. */
    minStableDepth: nullableNumber,
    /** Largest quiet ΔT at this depth [K]; null = no limit. */
    maxDeltaT: nullableNumber,
  }),
  solutal: z
    .object({
      marangoni: z.number(),
      /** Critical solutal Ma (Pearson's value for the same boundaries, insulating analogue) */
      critical: z.number(),
      margin: nullableNumber,
      /** thermal | solutal: which drive is nearer onset */
      dominant: z.enum(['thermal', 'solutal']),
    })
    .nullable(),
  lateralFlow: z
    .object({
      /** |dσ/dT|·ΔT_lateral / L [Pa] */ surfaceStress: z.number(),
      /** τ d / μ, open layer, no return flow [m/s] */ openLayerSpeed: z.number(),
      /** τ d / (4 μ), closed layer with return flow [m/s] */ closedLayerSpeed: z.number(),
      /** Toward the cooler end when dσ/dT < 0 */ direction: z.enum(['toward-cooler', 'toward-hotter']),
      text: z.string(),
    })
    .nullable(),
  defects: z.array(defectSchema),
  levers: z.array(leverSchema),
  cautions: z.array(z.string()),
  closingLine: z.string(),
  warnings: z.array(evaluationWarningSchema),
});
export type LayerEvaluation = z.infer<typeof layerEvaluationSchema>;

// ---------------------------------------------------------------------------------------------
// Quiet window
// ---------------------------------------------------------------------------------------------

/** Query of GET /api/layer-checks/:id/window (also the `window` part of POST /api/layer-checks/window). */
export const quietWindowQuerySchema = z.object({
  /** Depth range; default 0.2× … 5× the check's depth. */
  depthMin: quantityTextSchema.optional(),
  depthMax: quantityTextSchema.optional(),
  /** Upper end of the drive axis: ΔT ("20 K") or, for heat-flux/evaporation checks, heat flux ("2 kW/m²"). */
  driveMax: quantityTextSchema.optional(),
  /** Grid points per axis, 5…80 (default 40). */
  points: z.coerce.number().int().min(5, 'points must be ≥ 5').max(80, 'points must be ≤ 80').default(40),
});
export type QuietWindowQuery = z.input<typeof quietWindowQuerySchema>;

export const postQuietWindowInputSchema = z.strictObject({
  check: evaluateLayerCheckInputSchema,
  window: quietWindowQuerySchema.optional(),
});

export const quietWindowSchema = z.object({
  /** 'deltaT' → drive axis in K; 'heat-flux' → in W/m². */
  driveKind: z.enum(['deltaT', 'heat-flux']),
  /** [m], ascending */
  depths: z.array(z.number()),
  /** [K] or [W/m²], ascending */
  drives: z.array(z.number()),
  /** margin[i][j] at drives[i], depths[j]; null = no onset possible. */
  margin: z.array(z.array(nullableNumber)),
  /** Cellular onset boundary: for each depth, the drive at margin 1 (null = none in range). */
  cellBoundary: z.array(nullableNumber),
  /** Long-wave boundary: for each depth, the drive at which the long-wave mode sets in (null = none). */
  longWaveBoundary: z.array(nullableNumber),
  operatingPoint: z.object({ depth: z.number(), drive: z.number() }),
  sizing: z.object({ maxStableDepth: nullableNumber, minStableDepth: nullableNumber, maxDeltaT: nullableNumber }),
});
export type QuietWindow = z.infer<typeof quietWindowSchema>;
