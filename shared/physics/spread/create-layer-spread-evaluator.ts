import { layerGroups } from '../sizing/layer-groups';
import { layerStabilityProblem } from '../sizing/layer-stability-problem';
import type { PhysicalLayer } from '../sizing/types';
import { validatePhysicalLayer } from '../sizing/validate-physical-layer';
import { onsetMargin } from '../stability/onset-margin';
import { fitMarginSurrogate, type MarginSurrogate } from './fit-margin-surrogate';
import { layerMarginEvaluator } from './layer-margin-evaluator';
import type { SpreadEvaluator, SpreadPropertySpec } from './spread-types';

/** The evaluator a layer spread uses, and why. */
export interface LayerSpreadEvaluator {
  readonly evaluate: SpreadEvaluator;
  /** 'surrogate': validated response surface; 'solver': the full stability solve per sample. */
  readonly method: 'surrogate' | 'solver';
  /** Fit diagnostics when a surrogate was tried (also when it was rejected). */
  readonly surrogate: Omit<MarginSurrogate, 'evaluate'> | null;
  /** Plain sentence when the surrogate was tried and rejected. */
  readonly fallbackReason: string | null;
}

/**
 * Chooses the margin evaluator for a layer's Property spread: a validated response surface when
 * it reproduces the full solver within the tolerance, otherwise the full solver. Deterministic in
 * the seed, so every worker of a chunked run rebuilds the same evaluator.
 *
 * ## Method
 * `method: 'solver'` → `layerMarginEvaluator`. `method: 'surrogate'` (default) → `fitMarginSurrogate`
 * over the uncertain fields, one surface for the cellular mode (deformable surface) and one for
 * long-wave thinning, margin = the smaller, from full solves at 2× as many design points as
 * quadratic coefficients plus 24 validation points; accepted when the largest validation error ≤
 * `surrogateTolerance` (default 0.5 %) and no validation point is judged differently for onset;
 * otherwise (or when the fit fails, e.g. an infinite margin) the full solver is used.
 *
 * ## References
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley, ch. 5.
 *   doi:10.1002/9780470725184
 *
 * @param layer - nominal physical layer (SI)
 * @param properties - uncertain layer fields
 * @param options - seed; method; surrogateTolerance [-]
 * @returns the evaluator, the method used and the surrogate diagnostics
 * @example createLayerSpreadEvaluator(layer, props, { seed: 1 }).method // 'surrogate' when it validates
 */
export function createLayerSpreadEvaluator(
  layer: PhysicalLayer,
  properties: readonly SpreadPropertySpec[],
  options: { readonly seed: number; readonly method?: 'surrogate' | 'solver'; readonly surrogateTolerance?: number },
): LayerSpreadEvaluator {
  const solver = layerMarginEvaluator(layer);
  const tolerance = options.surrogateTolerance ?? 0.005;
  if (!(tolerance > 0 && tolerance < 1)) {
    throw new RangeError(`surrogateTolerance must be > 0 and < 1, got ${tolerance}`);
  }
  if (options.method === 'solver') {
    return Object.freeze({ evaluate: solver, method: 'solver' as const, surrogate: null, fallbackReason: null });
  }
  const base: Record<string, number> = {};
  for (const property of properties) base[property.name] = (layer as unknown as Record<string, number>)[property.name];
  // Onset is the first of two smooth modes (cellular, long-wave thinning); fit each on its own.
  const modes = (sample: Readonly<Record<string, number>>): number[] => {
    try {
      const checked = validatePhysicalLayer({ ...layer, ...sample });
      const onset = onsetMargin(layerStabilityProblem(checked, layerGroups(checked), { deformable: true }));
      return [onset.longWave ? Number.NaN : onset.margin, onset.longWaveMargin];
    } catch (error) {
      if (error instanceof RangeError) return [Number.NaN, Number.NaN];
      throw error;
    }
  };
  let fit: MarginSurrogate;
  try {
    fit = fitMarginSurrogate({ base, properties, evaluateModes: modes, seed: options.seed });
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    return Object.freeze({
      evaluate: solver,
      method: 'solver' as const,
      surrogate: null,
      fallbackReason: `No response surface could be fitted (${error.message}); every sample uses the full solver.`,
    });
  }
  const { evaluate, ...diagnostics } = fit;
  if (fit.maxRelativeError > tolerance || fit.onsetDisagreements > 0) {
    return Object.freeze({
      evaluate: solver,
      method: 'solver' as const,
      surrogate: Object.freeze(diagnostics),
      fallbackReason:
        `The response surface missed the full solver by up to ${(fit.maxRelativeError * 100).toPrecision(3)} % ` +
        `(tolerance ${(tolerance * 100).toPrecision(3)} %) or judged onset differently at ${fit.onsetDisagreements} ` +
        'validation points; every sample uses the full solver.',
    });
  }
  return Object.freeze({ evaluate, method: 'surrogate' as const, surrogate: Object.freeze(diagnostics), fallbackReason: null });
}
