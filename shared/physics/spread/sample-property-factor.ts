import { nextStandardNormal } from '../random/next-standard-normal';
import { nextUniform } from '../random/next-uniform';
import type { Xoshiro128State } from '../random/random-state';
import type { SpreadPropertySpec } from './spread-types';

/**
 * One random multiplicative factor for a property: the sampled value is base × factor.
 *
 * ## Method
 * normal: factor = 1 + u·z, z ~ N(0, 1) by Box–Muller, redrawn while factor ≤ 0 (a truncated
 * normal; with u ≤ 0.5 the truncated mass is Φ(−2) ≈ 0.023 at most and Φ(−1/u) in general);
 * uniform: factor = 1 + u·(2U − 1), U ~ U[0, 1).
 *
 * ## References
 * - Box G. E. P., Muller M. E. (1958) Ann. Math. Stat. 29(2):610–611. doi:10.1214/aoms/1177706645
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley, §1.2 (sampling
 *   input factors from their distributions). doi:10.1002/9780470725184
 *
 * @param state - generator state, advanced in place [-]
 * @param property - distribution and relative uncertainty u (1σ or half-width) [-]
 * @returns a positive factor [-]
 * @example samplePropertyFactor(seedXoshiro128State(1), { name: 'x', relativeUncertainty: 0,
 *   distribution: 'normal' }) // 1
 */
export function samplePropertyFactor(state: Xoshiro128State, property: SpreadPropertySpec): number {
  const u = property.relativeUncertainty;
  if (property.distribution === 'uniform') return 1 + u * (2 * nextUniform(state) - 1);
  for (;;) {
    const factor = 1 + u * nextStandardNormal(state);
    if (factor > 0) return factor;
  }
}
