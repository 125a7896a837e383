import type { Regime } from './types';

/** Inputs of classifyRegime. */
export interface RegimeInputs {
  /** Onset margin λ* [-] (Infinity when no stationary onset exists). */
  margin: number;
  /** Share of buoyancy at onset, 0..1 [-] (see onsetMargin). */
  buoyancyShare: number;
  /** True when the most dangerous mode is the long-wave deformational one. */
  longWave: boolean;
}

/** Buoyancy share at or above which onset counts as buoyancy-driven (our choice: Ra/Ra₀ ≥ 4·Ma/Ma₀). */
export const BUOYANCY_DOMINANT_SHARE = 0.8;
/** Buoyancy share at or below which onset counts as surface-tension-driven (Ra/Ra₀ ≤ Ma/Ma₀ / 4). */
export const SURFACE_TENSION_DOMINANT_SHARE = 0.2;

/**
 * Regime of a layer from its onset margin and the mechanism of its most dangerous mode.
 *
 * ## Method
 * margin ≥ 1 → 'quiet' (the operating point is below onset). Otherwise: long-wave deformational
 * mode → 'long-wave-thinning'; buoyancy share ≥ 0.8 → 'buoyancy-cells'; ≤ 0.2 →
 * 'surface-tension-cells'; in between → 'mixed-cells'. The share compares the two drives each
 * measured against its own single-drive threshold (Nield 1964: the two reinforce each other and
 * r + m ≈ 1 on the neutral curve), so 0.8 means buoyancy is four times nearer its own threshold
 * than thermocapillarity. The 0.2/0.8 cut-offs are QuietLayer's choice (derived from the
 * "well below / near / well above 1" reading of Ra/Ra_c against Ma/Ma_c), not a published rule.
 * An infinite margin is 'quiet'.
 *
 * ## References
 * - Nield, D. A. (1964) "Surface tension and buoyancy effects in cellular convection", J. Fluid
 *   Mech. 19, 341–352. doi:10.1017/S0022112064000763
 * - VanHook, S. J. et al. (1997) J. Fluid Mech. 345, 45–78 (long-wave deformational mode).
 *   doi:10.1017/S0022112097006101
 *
 * @param inputs - margin [-], buoyancyShare [-] in 0..1, longWave flag
 * @returns the regime
 * @throws RangeError when margin is NaN or negative, or buoyancyShare is outside 0..1 for a finite margin
 * @example classifyRegime({ margin: 0.6, buoyancyShare: 0.1, longWave: false }) // 'surface-tension-cells'
 */
export function classifyRegime(inputs: RegimeInputs): Regime {
  const { margin, buoyancyShare, longWave } = inputs;
  if (typeof margin !== 'number' || Number.isNaN(margin) || margin < 0)
    throw new RangeError(`margin must be a number ≥ 0 (Infinity allowed), got ${String(margin)}`);
  if (margin >= 1) return 'quiet';
  if (longWave) return 'long-wave-thinning';
  if (typeof buoyancyShare !== 'number' || !(buoyancyShare >= 0 && buoyancyShare <= 1))
    throw new RangeError(`buoyancyShare must be within 0..1, got ${String(buoyancyShare)}`);
  if (buoyancyShare >= BUOYANCY_DOMINANT_SHARE) return 'buoyancy-cells';
  if (buoyancyShare <= SURFACE_TENSION_DOMINANT_SHARE) return 'surface-tension-cells';
  return 'mixed-cells';
}
