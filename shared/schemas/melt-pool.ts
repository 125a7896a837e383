import { z } from 'zod';
import { pageQuerySchema } from './api-error';
import { siQuantitySchema } from './drying-paths';

/**
 * API contract of Melt pool flow (POST /api/melt-pool/evaluate), the heats register
 * (/api/heats) and melt-pool set-ups linking two heats to a layer check (/api/layer-checks/:id/melt-pool).
 *
 * Sulfur and oxygen are entered as a number with a unit: "0.012 wt %", "120 ppm", "0.012 %"; they are
 * held as wt % (ppm = wt % × 10⁴, by mass). Temperatures and the pool size take units ("1536 °C", "2.5 mm").
 */

/** Sulfur or oxygen content: text "0.012 wt %", "120 ppm", "0.012 %", or a number in wt %. Read to wt %. */
export function massContentSchema(label: string) {
  return z
    .union([z.number({ error: `${label} must be a number (wt %) or text such as "120 ppm"` }), z.string({ error: `${label} must be text such as "0.012 wt %"` })])
    .transform((value, ctx) => {
      let wtPercent: number;
      if (typeof value === 'number') wtPercent = value;
      else {
        const match = /^\s*([-+]?\d*\.?\d+(?:[eE][-+]?\d+)?)\s*(wt\s*%|mass\s*%|%|ppm|ppmw)\s*$/i.exec(value);
        if (!match) {
          ctx.addIssue({ code: 'custom', message: `${label}: write e.g. "0.012 wt %" or "120 ppm"` });
          return z.NEVER;
        }
        const unit = match[2].toLowerCase();
        wtPercent = Number(match[1]) / (unit.startsWith('ppm') ? 1e4 : 1);
      }
      if (!(wtPercent >= 0 && wtPercent <= 1)) {
        ctx.addIssue({ code: 'custom', message: `${label} must be from 0 to 1 wt % (0 to 10000 ppm)` });
        return z.NEVER;
      }
      return wtPercent;
    });
}

/** Body of POST /api/melt-pool/evaluate. Give the solute as sulfur content or as activity (wt % scale). */
export const meltPoolInputSchema = z
  .strictObject({
    sulfur: massContentSchema('sulfur').optional(),
    /** Surface-active solute activity on the 1 wt % scale [wt %]. */
    activity: z.number({ error: 'activity must be a number [wt %]' }).min(0, 'activity must be ≥ 0 wt %').max(1, 'activity must be ≤ 1 wt %').optional(),
    edgeTemperature: siQuantitySchema('temperature'),
    peakTemperature: siQuantitySchema('temperature'),
    /** Pool half-width L. */
    halfWidth: siQuantitySchema('length'),
    density: siQuantitySchema('density'),
    viscosity: siQuantitySchema('dynamicViscosity'),
    thermalDiffusivity: siQuantitySchema('diffusivity'),
  })
  .superRefine((input, ctx) => {
    if ((input.sulfur === undefined) === (input.activity === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['sulfur'], message: 'give either sulfur or activity (exactly one)' });
    }
    if (input.peakTemperature <= input.edgeTemperature) {
      ctx.addIssue({ code: 'custom', path: ['peakTemperature'], message: 'peakTemperature must be above edgeTemperature' });
    }
  });
export type MeltPoolInputBody = z.input<typeof meltPoolInputSchema>;
export type MeltPoolInputParsed = z.output<typeof meltPoolInputSchema>;

/** One point of the σ(T) curve. */
export interface SurfaceTensionPoint {
  /** [K] */
  temperature: number;
  /** [N/m] */
  surfaceTension: number;
  /** [N/(m·K)] */
  slope: number;
}

export interface WeldingCautionView {
  id: string;
  title: string;
  text: string;
  basis: string;
}

/** Answer of POST /api/melt-pool/evaluate (SI). */
export interface MeltPoolAnswer {
  activity: number;
  sulfurPpm: number;
  surfaceTensionAtEdge: number;
  surfaceTensionAtPeak: number;
  slopeAtEdge: number;
  slopeAtPeak: number;
  /** dσ/dT = 0 inside the pool's range [K], or null. */
  signChangeTemperature: number | null;
  /** dσ/dT = 0 anywhere from 1000 K to 3000 K at this activity [K], or null. */
  signChangeTemperatureWide: number | null;
  direction: 'outward' | 'inward' | 'mixed';
  poolShape: 'shallow-wide' | 'deep-narrow' | 'intermediate';
  /** The flow direction and pool-shape tendency in words. */
  directionText: string;
  marangoniNumber: number;
  pecletNumber: number;
  surfaceVelocity: number;
  surfaceStress: number;
  flowShapesPool: boolean;
  /** How the velocity scale was obtained. */
  velocityScaling: string;
  curve: SurfaceTensionPoint[];
  warnings: string[];
  cautions: WeldingCautionView[];
}

// ---------------------------------------------------------------------------------------------
// Heats register
// ---------------------------------------------------------------------------------------------

export const heatInputSchema = z.strictObject({
  heatNumber: z.string({ error: 'heatNumber is required' }).trim().min(1, 'heatNumber is required').max(60, 'heatNumber must be at most 60 characters'),
  supplier: z.string().trim().max(200, 'supplier must be at most 200 characters').default(''),
  product: z.string().trim().max(200, 'product must be at most 200 characters').default(''),
  /** Mill-test sulfur, e.g. "0.012 wt %" or "120 ppm". */
  sulfur: z.string({ error: 'sulfur is required, e.g. "0.012 wt %"' }).trim().min(1, 'sulfur is required').max(40),
  /** Mill-test oxygen (optional). */
  oxygen: z.string().trim().max(40).nullable().optional(),
  notes: z.string().trim().max(4000, 'notes must be at most 4000 characters').default(''),
});
export type HeatInput = z.input<typeof heatInputSchema>;

export const updateHeatInputSchema = heatInputSchema.extend({ version: z.number({ error: 'version is required' }).int().min(1) });
export type UpdateHeatInput = z.input<typeof updateHeatInputSchema>;

export const heatListQuerySchema = pageQuerySchema.extend({ q: z.string().trim().max(100).optional() });

export interface Heat {
  id: string;
  heatNumber: string;
  supplier: string;
  product: string;
  /** As entered. */
  sulfur: string;
  oxygen: string | null;
  /** [wt %] */
  sulfurWtPercent: number;
  oxygenWtPercent: number | null;
  /** [ppm by mass] */
  sulfurPpm: number;
  notes: string;
  version: number;
  createdAt: string;
  updatedAt: string;
}

// ---------------------------------------------------------------------------------------------
// Melt-pool set-up of a layer check: the pool input and the two heats being joined
// ---------------------------------------------------------------------------------------------

export const saveMeltPoolSetupInputSchema = z.strictObject({
  input: meltPoolInputSchema,
  firstHeatId: z.uuid({ error: 'firstHeatId must be the id of a heat' }),
  secondHeatId: z.uuid({ error: 'secondHeatId must be the id of a heat' }),
});
export type SaveMeltPoolSetupInput = z.input<typeof saveMeltPoolSetupInputSchema>;

export interface JoinedHeatsComparison {
  poolTemperature: number;
  sulfurDifferencePpm: number;
  parts: { heatId: string; heatNumber: string; sulfurPpm: number; bandPosition: string; surfaceTensionSlope: number; flowDirection: 'outward' | 'inward' }[];
  warnings: { code: string; message: string }[];
  notes: string[];
}

export interface MeltPoolSetup {
  id: string;
  checkId: string;
  revision: number;
  input: unknown;
  firstHeat: Heat;
  secondHeat: Heat;
  result: MeltPoolAnswer;
  comparison: JoinedHeatsComparison;
  createdAt: string;
}
