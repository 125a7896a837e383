import { requireFinite } from './require-finite';
import { requirePositive } from './require-positive';

/**
 * Dynamic Bond number, Bo_d = Ra/Ma = ρ g β d² / (−dσ/dT).
 *
 * ## Method
 * Ratio of buoyant to thermocapillary driving, independent of ΔT; well below Ra_c/Ma_c (≈ 8 for a
 * rigid conducting bottom and an insulating free top) surface tension dominates, well above it
 * buoyancy does. Returns ±Infinity when dσ/dT = 0 and β ≠ 0, and NaN when both are 0.
 *
 * ## References
 * - Nield D. A. (1964) "Surface tension and buoyancy effects in cellular convection", J. Fluid Mech.
 *   19, 341–352. doi:10.1017/S0022112064000763
 * - Davis S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435. doi:10.1146/annurev.fl.19.010187.002155
 *
 * @param input.density - ρ [kg/m³], > 0
 * @param input.gravity - g [m/s²], ≥ 0
 * @param input.expansion - β [1/K]
 * @param input.depth - d [m], > 0
 * @param input.surfaceTensionSlope - dσ/dT [N/(m·K)], negative for ordinary liquids
 * @returns dynamic Bond number [-] (NaN when β = dσ/dT = 0)
 * @example dynamicBondNumber({ density: 900, gravity: 9.81, expansion: 1e-3, depth: 2e-3, surfaceTensionSlope: -1e-4 }) // ≈ 0.353
 */
export function dynamicBondNumber(input: {
  density: number;
  gravity: number;
  expansion: number;
  depth: number;
  surfaceTensionSlope: number;
}): number {
  const rho = requirePositive('density', input.density, 'kg/m³');
  const g = requirePositive('gravity', input.gravity, 'm/s²', { allowZero: true });
  const beta = requireFinite('expansion', input.expansion, '1/K');
  const d = requirePositive('depth', input.depth, 'm');
  const slope = requireFinite('surfaceTensionSlope', input.surfaceTensionSlope, 'N/(m·K)');
  const buoyant = rho * g * beta * d * d;
  if (slope === 0) return buoyant === 0 ? NaN : Math.sign(buoyant) * Infinity;
  return buoyant / -slope;
}
