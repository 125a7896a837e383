import { createMarginalFactorEvaluator } from './create-marginal-factor-evaluator';
import { criticalFactor } from './critical-factor';
import { checkedHint, type CriticalSearchOptions } from './critical-search-options';
import type { CriticalValue, LayerBoundaries } from './types';
import { validateProblem } from './validate-problem';

/**
 * Critical Marangoni number of a layer with a flat free surface and no buoyancy (Ra = 0).
 *
 * ## Method
 * The marginal factor of the problem (Ra = 0, Ma = 1, flat surface) minimised over the
 * wavenumber equals Ma_c. With only the thermocapillary drive the reduced eigenproblem is 1×1
 * (see marginalFactorAt). For a rigid conducting bottom this reproduces Pearson's closed form
 * Ma(k) = 8k(k cosh k + Bi sinh k)(k − sinh k cosh k)/(k³ cosh k − sinh³ k).
 *
 * ## References
 * - Pearson, J. R. A. (1958) "On convection cells induced by surface tension", J. Fluid Mech. 4,
 *   489–500 (Ma_c = 79.607 at k_c = 1.993 for Bi = 0). doi:10.1017/S0022112058000616
 * - Davis, S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435 (Ma → 48 as k → 0 with an insulating
 *   bottom and Bi = 0). doi:10.1146/annurev.fl.19.010187.002155
 *
 * @param boundaries - bottom, bottomThermal, top (must be 'surface'), biot [-] (Infinity = conducting)
 * @param options - optional wavenumberHint [1/d] where the search starts (a neighbouring k_c); changes the cost, not the minimum
 * @returns Ma_c [-] (Infinity for a conducting top: no surface-temperature perturbation) and k_c
 *          [1/d] (0 when the minimum lies at k → 0; NaN when Ma_c is infinite)
 * @throws RangeError when top is not 'surface' or a boundary field is invalid
 * @example criticalMarangoni({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0 }) // ≈ { value: 79.607, wavenumber: 1.993 }
 */
export function criticalMarangoni(boundaries: LayerBoundaries, options: CriticalSearchOptions = {}): CriticalValue {
  if (boundaries?.top !== 'surface')
    throw new RangeError(`top must be 'surface' for a critical Marangoni number (thermocapillary stress acts only on a free surface), got ${String(boundaries?.top)}`);
  const checked = validateProblem({
    bottom: boundaries.bottom,
    bottomThermal: boundaries.bottomThermal,
    top: boundaries.top,
    biot: boundaries.biot,
    rayleigh: 0,
    marangoni: 1,
  });
  const minimum = criticalFactor(checked, createMarginalFactorEvaluator(checked), { wavenumberHint: checkedHint(options.wavenumberHint) });
  return Object.freeze({ value: minimum.factor, wavenumber: minimum.wavenumber });
}
