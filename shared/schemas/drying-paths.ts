import { z } from 'zod';
import { parseQuantity } from '../units/parse-quantity';
import type { QuantityKind } from '../units/quantity-kinds';
import type { DryingPathResult } from '../physics/drying/types';

/**
 * API contract of the Drying path (POST /api/drying-paths/evaluate, drying set-ups saved against a
 * layer check revision).
 *
 * Every physical quantity may be sent as text with its unit ("40 µm", "60 °C", "30 m/min",
 * "0.56 mPa·s") or as a plain number in SI. Fractions (volume solids, LFL, packing) may be sent as a
 * number 0…1 or as text in percent ("35 %"). Quantities that have no unit kind of their own are
 * numbers in the SI unit named in their comment. The answer is the physics core's DryingPathResult
 * in SI; infinite margins travel as null.
 */

/** A quantity: SI number, or text with a unit of `kind`; read to SI. A unit that cannot be read → 400 on the field. */
export function siQuantitySchema(kind: QuantityKind) {
  return z
    .union([z.number({ error: 'give a number (SI) or text with a unit' }), z.string({ error: 'give a number (SI) or text with a unit' })])
    .transform((value, ctx) => {
      if (typeof value === 'number') {
        if (!Number.isFinite(value)) {
          ctx.addIssue({ code: 'custom', message: 'must be a finite number' });
          return z.NEVER;
        }
        return value;
      }
      try {
        return parseQuantity(value.trim(), kind) as number;
      } catch (error) {
        ctx.addIssue({ code: 'custom', message: error instanceof Error ? error.message : 'cannot read this quantity' });
        return z.NEVER;
      }
    });
}

/** A fraction 0…1: a number, or text in percent ("35 %"). */
export function fractionSchema(label: string) {
  return z
    .union([z.number({ error: `${label} must be a number 0…1 or a percentage` }), z.string({ error: `${label} must be a number 0…1 or a percentage` })])
    .transform((value, ctx) => {
      let fraction: number;
      if (typeof value === 'number') fraction = value;
      else {
        const match = /^\s*([-+]?\d*\.?\d+(?:[eE][-+]?\d+)?)\s*(%|vol\s*%)?\s*$/.exec(value);
        if (!match) {
          ctx.addIssue({ code: 'custom', message: `${label}: write a fraction such as 0.35 or a percentage such as "35 %"` });
          return z.NEVER;
        }
        fraction = Number(match[1]) / (match[2] ? 100 : 1);
      }
      if (!(fraction >= 0 && fraction <= 1)) {
        ctx.addIssue({ code: 'custom', message: `${label} must lie between 0 and 1 (0 % and 100 %)` });
        return z.NEVER;
      }
      return fraction;
    });
}

const positiveNumber = (label: string, unit: string) =>
  z.number({ error: `${label} must be a number [${unit}]` }).positive(`${label} must be > 0 ${unit}`).finite();

/** Molar mass: a number in kg/mol, or text "92.14 g/mol" / "0.09214 kg/mol". */
export const molarMassSchema = z
  .union([z.number({ error: 'molarMass must be a number [kg/mol] or text such as "92.14 g/mol"' }), z.string()])
  .transform((value, ctx) => {
    let si: number;
    if (typeof value === 'number') si = value;
    else {
      const match = /^\s*([-+]?\d*\.?\d+(?:[eE][-+]?\d+)?)\s*(g\/mol|kg\/mol)\s*$/.exec(value);
      if (!match) {
        ctx.addIssue({ code: 'custom', message: 'molarMass: write e.g. "92.14 g/mol" or "0.09214 kg/mol"' });
        return z.NEVER;
      }
      si = Number(match[1]) * (match[2] === 'g/mol' ? 1e-3 : 1);
    }
    if (!(si > 0 && si < 10)) {
      ctx.addIssue({ code: 'custom', message: 'molarMass must be > 0 and < 10 kg/mol' });
      return z.NEVER;
    }
    return si;
  });

const andradeFields = {
  /** Reference temperature of the solvent viscosity (absolute). */
  referenceTemperature: siQuantitySchema('temperature').optional(),
  /** B of μ_s(T) = μ_s·exp(B(1/T − 1/T_ref)) [K]; 0 = no temperature dependence. */
  activationTemperature: z.number({ error: 'activationTemperature must be a number [K]' }).min(0, 'activationTemperature must be ≥ 0 K').max(20_000, 'activationTemperature must be ≤ 20000 K').optional(),
};

export const viscosityLawInputSchema = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('krieger-dougherty'),
    solventViscosity: siQuantitySchema('dynamicViscosity'),
    intrinsicViscosity: positiveNumber('intrinsicViscosity', '[-]'),
    maxPackingFraction: fractionSchema('maxPackingFraction'),
    ...andradeFields,
  }),
  z.strictObject({
    kind: z.literal('exponential'),
    solventViscosity: siQuantitySchema('dynamicViscosity'),
    exponent: z.number({ error: 'exponent must be a number [-]' }).min(0, 'exponent must be ≥ 0').max(200, 'exponent must be ≤ 200'),
    ...andradeFields,
  }),
]);

export const solventVolatilityInputSchema = z.discriminatedUnion('kind', [
  z.strictObject({
    kind: z.literal('antoine'),
    /** log₁₀(p/bar) = A − B/(T/K + C) (NIST WebBook form). */
    a: z.number({ error: 'a must be a number' }).finite(),
    /** [K] */
    b: z.number({ error: 'b must be a number [K]' }).finite(),
    /** [K] */
    c: z.number({ error: 'c must be a number [K]' }).finite(),
    validFrom: siQuantitySchema('temperature').optional(),
    validTo: siQuantitySchema('temperature').optional(),
  }),
  z.strictObject({ kind: z.literal('fixed-rate'), evaporationRate: siQuantitySchema('massFlux') }),
]);

export const dryingSolventInputSchema = z.strictObject({
  name: z.string({ error: 'name is required' }).trim().min(1, 'name is required').max(120, 'name must be at most 120 characters'),
  density: siQuantitySchema('density'),
  latentHeat: siQuantitySchema('latentHeat'),
  molarMass: molarMassSchema,
  volatility: solventVolatilityInputSchema,
  diffusivity: siQuantitySchema('diffusivity'),
  diffusivitySolidsExponent: z.number().min(0, 'diffusivitySolidsExponent must be ≥ 0').max(100, 'diffusivitySolidsExponent must be ≤ 100').optional(),
  vapourDiffusivityInAir: siQuantitySchema('diffusivity').optional(),
  lowerFlammableLimit: fractionSchema('lowerFlammableLimit'),
});

export const dryingFilmInputSchema = z.strictObject({
  density: siQuantitySchema('density'),
  heatCapacity: siQuantitySchema('heatCapacity'),
  conductivity: siQuantitySchema('conductivity'),
  expansion: siQuantitySchema('expansion'),
  surfaceTension: siQuantitySchema('surfaceTension'),
  surfaceTensionTemperatureSlope: siQuantitySchema('surfaceTensionSlope'),
  /** dσ/dψ per unit solvent volume fraction [N/m] (text "-12 mN/m"). */
  surfaceTensionConcentrationSlope: siQuantitySchema('surfaceTension'),
});

export const ovenZoneInputSchema = z.strictObject({
  name: z.string().trim().max(60, 'name must be at most 60 characters').optional(),
  length: siQuantitySchema('length').optional(),
  /** Time in the zone [s] (schedule transport). */
  duration: z.number({ error: 'duration must be a number [s]' }).positive('duration must be > 0 s').max(86_400, 'duration must be ≤ 86400 s').optional(),
  airTemperature: siQuantitySchema('temperature'),
  heatTransferCoefficient: siQuantitySchema('heatTransferCoefficient'),
  backHeatTransferCoefficient: siQuantitySchema('heatTransferCoefficient').optional(),
  massTransferCoefficient: siQuantitySchema('speed').optional(),
  /** Solvent vapour in the zone air [kg/m³]. */
  ambientVapourConcentration: siQuantitySchema('density').optional(),
});

export const ovenTransportInputSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('line'), lineSpeed: siQuantitySchema('speed'), webWidth: siQuantitySchema('length').optional() }),
  z.strictObject({ kind: z.literal('schedule') }),
]);

export const dryingSubstrateInputSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('held'), temperature: siQuantitySchema('temperature') }),
  z.strictObject({
    kind: z.literal('thermal-mass'),
    /** ρc × thickness of the substrate [J/(m²·K)]. */
    arealHeatCapacity: positiveNumber('arealHeatCapacity', 'J/(m²·K)').max(1e7, 'arealHeatCapacity must be ≤ 10⁷ J/(m²·K)'),
    initialTemperature: siQuantitySchema('temperature'),
  }),
]);

/** Body of POST /api/drying-paths/evaluate: the Drying path input (mirrors the physics core's DryingPathInput). */
export const dryingPathInputSchema = z
  .strictObject({
    wetThickness: siQuantitySchema('length'),
    solidsFraction: fractionSchema('solidsFraction'),
    solvent: dryingSolventInputSchema,
    film: dryingFilmInputSchema,
    viscosity: viscosityLawInputSchema,
    oven: z.strictObject({
      transport: ovenTransportInputSchema,
      zones: z.array(ovenZoneInputSchema).min(1, 'give at least one oven zone').max(20, 'at most 20 oven zones'),
    }),
    substrate: dryingSubstrateInputSchema,
    air: z
      .strictObject({ density: siQuantitySchema('density'), heatCapacity: siQuantitySchema('heatCapacity'), thermalDiffusivity: siQuantitySchema('diffusivity') })
      .optional(),
    freezeViscosity: siQuantitySchema('dynamicViscosity').optional(),
    freezeSolidsFraction: fractionSchema('freezeSolidsFraction').optional(),
    surface: z.enum(['flat', 'deformable']).optional(),
    continuousSolventMonitoring: z.boolean().optional(),
    gridPoints: z.number().int('gridPoints must be a whole number').min(2, 'gridPoints must be ≥ 2').max(1001, 'gridPoints must be ≤ 1001').optional(),
    rtol: z.number().min(1e-12, 'rtol must be ≥ 1e-12').max(1e-3, 'rtol must be ≤ 0.001').optional(),
  })
  .superRefine((input, ctx) => {
    const line = input.oven.transport.kind === 'line';
    input.oven.zones.forEach((zone, i) => {
      if (line && zone.length === undefined) {
        ctx.addIssue({ code: 'custom', path: ['oven', 'zones', i, 'length'], message: 'each zone needs a length when the oven runs at a line speed' });
      }
      if (!line && zone.duration === undefined) {
        ctx.addIssue({ code: 'custom', path: ['oven', 'zones', i, 'duration'], message: 'each zone needs a duration [s] on a time schedule' });
      }
      if (zone.massTransferCoefficient === undefined && input.solvent.volatility.kind === 'antoine' && input.air === undefined) {
        ctx.addIssue({ code: 'custom', path: ['air'], message: 'give the air properties (or every zone a mass-transfer coefficient) for the Chilton–Colburn analogy' });
      }
    });
  });
export type DryingPathInputBody = z.input<typeof dryingPathInputSchema>;
export type DryingPathInputParsed = z.output<typeof dryingPathInputSchema>;

/** The Drying path answer: the physics core's result, SI, infinite margins as null after JSON. */
export type DryingPathAnswer = DryingPathResult & {
  /** Process cautions for a solvent-borne drying coat or cast film, most important first. */
  cautions: string[];
  /** QuietLayer is not a safety design tool. */
  closingLine: string;
};

/** Body of POST /api/layer-checks/:id/drying-setups. */
export const saveDryingSetupInputSchema = z.strictObject({
  title: z.string({ error: 'title is required' }).trim().min(1, 'title is required').max(200, 'title must be at most 200 characters'),
  input: dryingPathInputSchema,
});
export type SaveDryingSetupInput = z.input<typeof saveDryingSetupInputSchema>;

/** What is kept of a Drying path result with a saved set-up (and shown on the process sheet). */
export interface DryingPathSummary {
  verdict: DryingPathResult['onset']['verdict'];
  verdictText: string;
  cellsPossibleAt: number | null;
  drive: 'solutal' | 'thermal' | null;
  frozenAt: number | null;
  frozenBy: 'viscosity' | 'solids' | null;
  /** null = infinite (no onset possible) */
  minThermalMargin: number | null;
  minSolutalMargin: number | null;
  growthExponent: number;
  decayExponent: number;
  expectedDryThickness: number;
  modelledDryThickness: number;
  exitSolventFraction: number;
  zones: {
    name: string;
    residenceTime: number;
    thicknessOut: number;
    solidsOut: number;
    maxFilmTemperature: number;
    solventLitresPerMinute: number | null;
    freshAirRequired: number | null;
    lflFraction: number | null;
    ventilationText: string | null;
  }[];
  warnings: string[];
}

export interface DryingSetup {
  id: string;
  checkId: string;
  revision: number;
  title: string;
  /** The input as validated (SI numbers). */
  input: unknown;
  summary: DryingPathSummary;
  createdAt: string;
  createdByName: string | null;
}
