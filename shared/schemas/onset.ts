import { z } from 'zod';

/**
 * Contract of the batch onset evaluation (command `npm run onset -- FILE` and POST /api/batch/evaluate):
 * one case per CSV row or JSON array element, SI units, and one result per case in the same order.
 *
 * Input cells may be numbers or text (CSV); a blank cell means "not given". A case is either
 * dimensionless (rayleigh, marangoni, biot) or physical (density … gravity), never both.
 */

const DIMENSIONLESS_FIELDS = ['rayleigh', 'marangoni', 'biot'] as const;
/** Physical fields that every physical case must give (heatTransfer and gravity have defaults). */
export const requiredPhysicalFields = [
  'density',
  'viscosity',
  'conductivity',
  'heatCapacity',
  'expansion',
  'surfaceTension',
  'dSigmaDT',
  'depth',
  'deltaT',
] as const;
const PHYSICAL_FIELDS = [...requiredPhysicalFields, 'heatTransfer', 'gravity'] as const;

/** Every input field name, in the documented order. */
export const onsetCaseInputFields = ['id', 'bottom', 'bottomThermal', 'top', ...DIMENSIONLESS_FIELDS, ...PHYSICAL_FIELDS] as const;

/** Every output field name, in the order the command writes them. */
export const onsetCaseResultFields = [
  'id',
  'rayleigh',
  'marangoni',
  'biot',
  'prandtl',
  'bond',
  'crispation',
  'galileo',
  'criticalRayleigh',
  'criticalMarangoni',
  'cellMargin',
  'criticalWavenumber',
  'wavelength',
  'margin',
  'regime',
  'longWave',
  'maxStableDepth',
  'minStableDepth',
  'maxDeltaT',
  'error',
] as const;

const blank = (value: unknown) => value === undefined || value === null || (typeof value === 'string' && value.trim() === '');

function describe(value: unknown): string {
  return typeof value === 'string' ? `"${value}"` : String(value);
}

/** A number cell: blank → undefined; text → Number(text); must be finite and satisfy `check`. */
function numberCell(limit: 'any' | 'positive' | 'nonNegative') {
  return z
    .unknown()
    .transform((value, ctx): number | undefined => {
      if (blank(value)) return undefined;
      const number = typeof value === 'string' ? Number(value.trim()) : value;
      if (typeof number !== 'number' || !Number.isFinite(number)) {
        ctx.addIssue({ code: 'custom', message: `must be a finite number, got ${describe(value)}` });
        return z.NEVER;
      }
      if (limit === 'positive' && !(number > 0)) {
        ctx.addIssue({ code: 'custom', message: `must be > 0, got ${number}` });
        return z.NEVER;
      }
      if (limit === 'nonNegative' && !(number >= 0)) {
        ctx.addIssue({ code: 'custom', message: `must be ≥ 0, got ${number}` });
        return z.NEVER;
      }
      return number;
    })
    .optional();
}

/** The Biot cell also accepts "Infinity" or "inf" (a conducting top). */
const biotCell = z.unknown().transform((value, ctx): number | undefined => {
  if (blank(value)) return undefined;
  if (value === Infinity || (typeof value === 'string' && /^\s*\+?(infinity|inf)\s*$/i.test(value))) return Infinity;
  const number = typeof value === 'string' ? Number(value.trim()) : value;
  if (typeof number !== 'number' || !Number.isFinite(number) || number < 0) {
    ctx.addIssue({ code: 'custom', message: `must be a number ≥ 0 or Infinity (conducting top), got ${describe(value)}` });
    return z.NEVER;
  }
  return number;
}).optional();

function choiceCell<const T extends readonly [string, ...string[]]>(choices: T) {
  return z.unknown().transform((value, ctx): T[number] => {
    const text = typeof value === 'string' ? value.trim() : value;
    if (typeof text === 'string' && (choices as readonly string[]).includes(text)) return text as T[number];
    ctx.addIssue({
      code: 'custom',
      message: blank(value) ? `is required (${choices.join(' | ')})` : `must be ${choices.join(' | ')}, got ${describe(value)}`,
    });
    return z.NEVER;
  });
}

const idCell = z.unknown().transform((value, ctx): string => {
  if (blank(value)) {
    ctx.addIssue({ code: 'custom', message: 'is required' });
    return z.NEVER;
  }
  if (typeof value !== 'string' && typeof value !== 'number') {
    ctx.addIssue({ code: 'custom', message: `must be text or a number, got ${describe(value)}` });
    return z.NEVER;
  }
  return String(value).trim();
});

const rowShape = {
  id: idCell,
  bottom: choiceCell(['rigid', 'free'] as const),
  bottomThermal: choiceCell(['conducting', 'insulating'] as const),
  top: choiceCell(['rigid', 'free', 'surface'] as const),
  rayleigh: numberCell('any'),
  marangoni: numberCell('any'),
  biot: biotCell,
  density: numberCell('positive'),
  viscosity: numberCell('positive'),
  conductivity: numberCell('positive'),
  heatCapacity: numberCell('positive'),
  expansion: numberCell('any'),
  surfaceTension: numberCell('positive'),
  dSigmaDT: numberCell('any'),
  depth: numberCell('positive'),
  deltaT: numberCell('any'),
  heatTransfer: numberCell('nonNegative'),
  gravity: numberCell('nonNegative'),
};

/**
 * One batch case as given (CSV row or JSON object), checked and turned into a tagged case.
 * Unknown fields with a value are refused by name (they are usually misspellings).
 */
export const onsetCaseInputSchema = z
  .record(z.string(), z.unknown())
  .superRefine((row, ctx) => {
    for (const [key, value] of Object.entries(row)) {
      if (!(onsetCaseInputFields as readonly string[]).includes(key) && !blank(value)) {
        ctx.addIssue({ code: 'custom', path: [key], message: `is not a known field (expected one of ${onsetCaseInputFields.join(', ')})` });
      }
    }
  })
  .pipe(z.object(rowShape))
  .transform((row, ctx) => {
    const { id, bottom, bottomThermal, top } = row;
    const givenDimensionless = DIMENSIONLESS_FIELDS.filter((f) => row[f] !== undefined);
    const givenPhysical = PHYSICAL_FIELDS.filter((f) => row[f] !== undefined);
    if (givenDimensionless.length > 0 && givenPhysical.length > 0) {
      ctx.addIssue({
        code: 'custom',
        path: [givenDimensionless[0]],
        message: `give either dimensionless fields (rayleigh, marangoni, biot) or physical fields, not both (found ${givenDimensionless.join(', ')} and ${givenPhysical.join(', ')})`,
      });
      return z.NEVER;
    }
    if (givenPhysical.length > 0) {
      const missing = requiredPhysicalFields.filter((f) => row[f] === undefined);
      for (const field of missing) ctx.addIssue({ code: 'custom', path: [field], message: 'is required for a physical case' });
      if (missing.length > 0) return z.NEVER;
      return {
        kind: 'physical' as const,
        id,
        layer: {
          bottom,
          bottomThermal,
          top,
          density: row.density!,
          viscosity: row.viscosity!,
          conductivity: row.conductivity!,
          heatCapacity: row.heatCapacity!,
          expansion: row.expansion!,
          surfaceTension: row.surfaceTension!,
          dSigmaDT: row.dSigmaDT!,
          depth: row.depth!,
          deltaT: row.deltaT!,
          heatTransfer: row.heatTransfer ?? 0,
          gravity: row.gravity ?? 9.80665,
        },
      };
    }
    if (row.rayleigh === undefined && row.marangoni === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['rayleigh'],
        message: 'is required: give rayleigh and/or marangoni (with biot), or the physical fields density … deltaT',
      });
      return z.NEVER;
    }
    return {
      kind: 'dimensionless' as const,
      id,
      problem: {
        bottom,
        bottomThermal,
        top,
        rayleigh: row.rayleigh ?? 0,
        marangoni: row.marangoni ?? 0,
        biot: row.biot ?? (top === 'surface' ? 0 : Infinity),
      },
    };
  });

/** A checked batch case. */
export type OnsetCase = z.output<typeof onsetCaseInputSchema>;

const nullableNumber = z.number().nullable();

/**
 * One batch result. Numbers are SI (m, K) or dimensionless; null means "empty": not applicable to
 * this kind of case, infinite (no onset), no bound found, or the case failed (then `error` says why).
 * `biot` may be the text "Infinity" (a conducting top).
 */
export const onsetCaseResultSchema = z.object({
  id: z.string(),
  rayleigh: nullableNumber,
  marangoni: nullableNumber,
  biot: z.union([z.number(), z.literal('Infinity')]).nullable(),
  prandtl: nullableNumber,
  bond: nullableNumber,
  crispation: nullableNumber,
  galileo: nullableNumber,
  criticalRayleigh: nullableNumber,
  criticalMarangoni: nullableNumber,
  cellMargin: nullableNumber,
  criticalWavenumber: nullableNumber,
  wavelength: nullableNumber,
  margin: nullableNumber,
  regime: z.enum(['Quiet', 'Surface-tension cells', 'Buoyancy cells', 'Mixed cells', 'Long-wave thinning']).nullable(),
  longWave: z.boolean().nullable(),
  maxStableDepth: nullableNumber,
  minStableDepth: nullableNumber,
  maxDeltaT: nullableNumber,
  error: z.string().nullable(),
});
export type OnsetCaseResult = z.infer<typeof onsetCaseResultSchema>;

/** POST /api/batch/evaluate body: the cases as parsed from the uploaded CSV or JSON (at most 10,000). */
export const batchEvaluateRequestSchema = z.object({
  cases: z.array(z.record(z.string(), z.unknown())).min(1).max(10_000),
});
export type BatchEvaluateRequest = z.infer<typeof batchEvaluateRequestSchema>;

/** POST /api/batch/evaluate answer: one result per case, in order. */
export const batchEvaluateResponseSchema = z.object({ results: z.array(onsetCaseResultSchema) });
export type BatchEvaluateResponse = z.infer<typeof batchEvaluateResponseSchema>;
