import { z } from 'zod';
import { LAYER_SPREAD_FIELDS } from '../physics/spread/layer-margin-evaluator';
import type { SpreadResult, SpreadSwing } from '../physics/spread/spread-types';

/**
 * API contract of the Property spread of a saved layer check (POST /api/layer-checks/:id/spreads,
 * GET /api/property-spreads/:id, GET /api/layer-checks/:id/spreads).
 *
 * Up to INLINE_SPREAD_LIMIT samples run in the request and answer 201 with the result; larger runs
 * (up to MAX_SPREAD_SAMPLES) answer 202 with status 'queued' and run on the job queue, chunk by chunk.
 * The same seed, uncertainties and check revision always give the same result.
 */

/** Largest run answered in the request. */
export const INLINE_SPREAD_LIMIT = 10_000;
/** Largest run accepted (job queue). */
export const MAX_SPREAD_SAMPLES = 1_000_000;

export const spreadFieldSchema = z.enum(LAYER_SPREAD_FIELDS);
export type SpreadField = z.infer<typeof spreadFieldSchema>;

/** Layer fields in the words people read. */
export const spreadFieldLabels: Readonly<Record<SpreadField, string>> = Object.freeze({
  density: 'Density',
  viscosity: 'Viscosity',
  conductivity: 'Thermal conductivity',
  heatCapacity: 'Heat capacity',
  expansion: 'Thermal expansion',
  surfaceTension: 'Surface tension',
  dSigmaDT: 'dσ/dT',
  depth: 'Depth',
  deltaT: 'Temperature difference',
  heatTransfer: 'Top heat-transfer coefficient',
  gravity: 'Gravity',
});

/** One uncertain property: ± percent (1σ for normal, half-width for uniform). */
export const spreadUncertaintyInputSchema = z.strictObject({
  name: spreadFieldSchema,
  uncertaintyPercent: z
    .number({ error: 'uncertaintyPercent must be a number' })
    .gt(0, 'uncertaintyPercent must be > 0 %')
    .max(50, 'uncertaintyPercent must be ≤ 50 %'),
  distribution: z.enum(['normal', 'uniform']).default('normal'),
});
export type SpreadUncertaintyInput = z.input<typeof spreadUncertaintyInputSchema>;
export type SpreadUncertainty = z.output<typeof spreadUncertaintyInputSchema>;

/** Body of POST /api/layer-checks/:id/spreads. */
export const runSpreadInputSchema = z.strictObject({
  samples: z
    .number({ error: 'samples must be a whole number' })
    .int('samples must be a whole number')
    .min(100, 'samples must be at least 100')
    .max(MAX_SPREAD_SAMPLES, `samples must be at most ${MAX_SPREAD_SAMPLES.toLocaleString('en-GB')}`),
  seed: z
    .number({ error: 'seed must be a whole number' })
    .int('seed must be a whole number')
    .min(0, 'seed must be ≥ 0')
    .max(Number.MAX_SAFE_INTEGER, `seed must be ≤ ${Number.MAX_SAFE_INTEGER}`),
  /** Replaces the uncertainties stated in the fluid library for this run (at least one). */
  uncertainties: z
    .array(spreadUncertaintyInputSchema)
    .min(1, 'give at least one uncertainty or leave uncertainties out')
    .max(LAYER_SPREAD_FIELDS.length)
    .refine((list) => new Set(list.map((u) => u.name)).size === list.length, 'each property may appear once')
    .optional(),
});
export type RunSpreadInput = z.input<typeof runSpreadInputSchema>;

export type SpreadStatus = 'queued' | 'running' | 'done' | 'failed';

/** The finished figures (physics core SpreadResult) plus swings and which evaluator was used. Infinite values travel as null. */
export type SpreadRunResult = SpreadResult & {
  swing: readonly SpreadSwing[];
  method: 'surrogate' | 'solver';
  fallbackReason: string | null;
};

/** A stored Property spread (answer of POST and GET). */
export interface PropertySpread {
  id: string;
  checkId: string;
  revision: number;
  status: SpreadStatus;
  samples: number;
  seed: number;
  /** Share of the samples evaluated, 0…1. */
  progress: number;
  evaluatedSamples: number;
  uncertainties: SpreadUncertainty[];
  result: SpreadRunResult | null;
  error: string | null;
  createdAt: string;
  finishedAt: string | null;
}
