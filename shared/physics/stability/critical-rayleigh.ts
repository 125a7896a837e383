import { createMarginalFactorEvaluator } from './create-marginal-factor-evaluator';
import { criticalFactor } from './critical-factor';
import { checkedHint, type CriticalSearchOptions } from './critical-search-options';
import type { CriticalValue, LayerBoundaries } from './types';
import { validateProblem } from './validate-problem';

/**
 * Critical Rayleigh number of a layer with a flat top and no thermocapillary stress (Ma = 0).
 *
 * ## Method
 * The marginal factor of the problem (Ra = 1, Ma = 0) minimised over the wavenumber equals
 * Ra_c (see marginalFactor for the equations and criticalFactor for the minimisation). A
 * 'surface' top then acts as a flat stress-free top with the given Biot condition.
 *
 * ## References
 * - Chandrasekhar, S. (1961) *Hydrodynamic and Hydromagnetic Stability*, Oxford, ch. II
 *   (1707.762 rigid/rigid, 1100.65 rigid/free, 27π⁴/4 free/free).
 * - Reid, W. H. & Harris, D. L. (1958) Phys. Fluids 1, 102–110. doi:10.1063/1.1705871
 * - Nield, D. A. (1964) J. Fluid Mech. 19, 341–352 (669.00, rigid bottom, insulating free top).
 *
 * @param boundaries - bottom, bottomThermal, top, biot [-] (Infinity = conducting top)
 * @param options - optional wavenumberHint [1/d] where the search starts (a neighbouring k_c); changes the cost, not the minimum
 * @returns Ra_c [-] and k_c [1/d] (0 when the minimum lies at k → 0, as with two insulating walls)
 * @throws RangeError naming the field when a boundary field is invalid
 * @example criticalRayleigh({ bottom: 'rigid', bottomThermal: 'conducting', top: 'rigid', biot: Infinity }) // ≈ { value: 1707.762, wavenumber: 3.117 }
 */
export function criticalRayleigh(boundaries: LayerBoundaries, options: CriticalSearchOptions = {}): CriticalValue {
  const checked = validateProblem({
    bottom: boundaries?.bottom,
    bottomThermal: boundaries?.bottomThermal,
    top: boundaries?.top,
    biot: boundaries?.biot,
    rayleigh: 1,
    marangoni: 0,
  } as LayerBoundaries);
  const minimum = criticalFactor(checked, createMarginalFactorEvaluator(checked), { wavenumberHint: checkedHint(options.wavenumberHint) });
  return Object.freeze({ value: minimum.factor, wavenumber: minimum.wavenumber });
}
