import type { SpreadEvaluator, SpreadPropertySpec, SpreadSwing } from './spread-types';

/**
 * One-at-a-time swing: the margin with each property moved down and up by its stated
 * uncertainty while the others stay nominal — the deterministic companion of the rank
 * correlations, and the bar lengths of a tornado chart.
 *
 * ## Method
 * marginLow = M(…, xᵢ·(1 − uᵢ), …), marginHigh = M(…, xᵢ·(1 + uᵢ), …); swing = |high − low|;
 * sorted largest first. It ignores interactions between properties, which is why the Monte Carlo
 * rank correlations are reported beside it.
 *
 * ## References
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley, §1.2.1 and ch. 3
 *   (one-at-a-time designs and their limits). doi:10.1002/9780470725184
 *
 * @param base - nominal property values (SI)
 * @param properties - the uncertain properties (u as 1σ or half-width)
 * @param evaluate - margin of one set of values [×]
 * @returns one swing per property, largest first [-]
 * @example marginSwingPerProperty({ x: 2 }, [{ name: 'x', relativeUncertainty: 0.1,
 *   distribution: 'normal' }], (s) => s.x)[0].swing // 0.4
 */
export function marginSwingPerProperty(
  base: Readonly<Record<string, number>>,
  properties: readonly SpreadPropertySpec[],
  evaluate: SpreadEvaluator,
): readonly SpreadSwing[] {
  const swings = properties.map((property, i) => {
    const nominal = base[property.name];
    if (!Number.isFinite(nominal)) throw new RangeError(`base.${property.name} must be a finite number`);
    const u = property.relativeUncertainty;
    const marginLow = evaluate({ ...base, [property.name]: nominal * (1 - u) }, -2 * i - 1);
    const marginHigh = evaluate({ ...base, [property.name]: nominal * (1 + u) }, -2 * i - 2);
    return Object.freeze({ name: property.name, marginLow, marginHigh, swing: Math.abs(marginHigh - marginLow) });
  });
  return Object.freeze(swings.sort((a, b) => (b.swing || 0) - (a.swing || 0)));
}
