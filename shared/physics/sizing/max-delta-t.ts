import type { OnsetResult } from '../stability/types';
import type { DeltaTLimits } from './types';

/**
 * Largest temperature drop across the layer before onset, at the layer's depth.
 *
 * ## Method
 * With depth and properties fixed, Ra and Ma are both proportional to ΔT while Bi, Cr and Bo do not
 * depend on it, so the onset margin along the ray scales as 1/ΔT and the onset ΔT is λ*·ΔT, for the
 * flat cellular mode (cellMargin) and for the most dangerous mode (margin). The sign follows ΔT
 * (negative when heated from above). For ΔT = 0 pass the result at a reference ΔT and that ΔT.
 *
 * ## References
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4, 489–500 (Ma ∝ ΔT at fixed depth).
 * - Nield D. A. (1964) J. Fluid Mech. 19, 341–352 (Ra and Ma on one ray).
 *
 * @param onset - the onset result at temperature drop `deltaT`
 * @param deltaT - the temperature drop it was computed at [K], ≠ 0
 * @returns frozen {@link DeltaTLimits} [K] (±Infinity when no onset)
 * @example maxDeltaT({ ...onset, margin: 2, cellMargin: 3 }, 5) // { cellular: 15, mostDangerous: 10 }
 */
export function maxDeltaT(onset: Pick<OnsetResult, 'margin' | 'cellMargin'>, deltaT: number): DeltaTLimits {
  if (!Number.isFinite(deltaT) || deltaT === 0) throw new RangeError(`deltaT must be finite and non-zero [K], got ${deltaT}`);
  return Object.freeze({ cellular: onset.cellMargin * deltaT, mostDangerous: onset.margin * deltaT });
}
