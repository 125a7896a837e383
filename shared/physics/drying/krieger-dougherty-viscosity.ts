import { requirePositive } from '../groups/require-positive';

/**
 * Viscosity of a suspension (or a concentrating coating) against its solids volume fraction by the
 * Krieger–Dougherty law.
 *
 * ## Method
 * μ = μ_s·(1 − φ/φ_m)^(−[η]·φ_m), with μ_s the continuous-phase (solvent) viscosity, [η] the intrinsic
 * viscosity (2.5 for hard spheres, Einstein's value) and φ_m the maximum packing fraction (≈ 0.64 for
 * random close packing of monodisperse spheres). For φ → 0 it reduces to Einstein's
 * μ/μ_s ≈ 1 + [η]φ; it diverges as φ → φ_m, so φ ≥ φ_m returns Infinity (a jammed, frozen film).
 * Valid for φ in [0, φ_m); for polymer solutions it is an empirical fit, not a theory.
 *
 * ## References
 * - Krieger I.M., Dougherty T.J. (1959) "A mechanism for non-Newtonian flow in suspensions of rigid
 *   spheres", Trans. Soc. Rheol. 3:137–152. doi:10.1122/1.548848
 * - Einstein A. (1906) "Eine neue Bestimmung der Moleküldimensionen", Ann. Phys. 19:289–306.
 *   doi:10.1002/andp.19063240204
 *
 * @param input.solventViscosity - μ_s [Pa·s], > 0
 * @param input.solidsFraction - φ, solids volume fraction [-], ≥ 0
 * @param input.maxPackingFraction - φ_m [-], in (0, 1]
 * @param input.intrinsicViscosity - [η] [-], > 0
 * @returns viscosity μ [Pa·s]; Infinity when φ ≥ φ_m
 * @example kriegerDoughertyViscosity({ solventViscosity: 1e-3, solidsFraction: 0.32, maxPackingFraction: 0.64, intrinsicViscosity: 2.5 })
 * // ≈ 0.0040 (= 1e-3 · 0.5^−1.6 ≈ 1e-3 · 3.031)
 */
export function kriegerDoughertyViscosity(input: {
  solventViscosity: number;
  solidsFraction: number;
  maxPackingFraction: number;
  intrinsicViscosity: number;
}): number {
  const mu = requirePositive('solventViscosity', input.solventViscosity, 'Pa·s');
  const phi = requirePositive('solidsFraction', input.solidsFraction, '-', { allowZero: true });
  const phiM = requirePositive('maxPackingFraction', input.maxPackingFraction, '-');
  if (phiM > 1) throw new RangeError(`maxPackingFraction must be ≤ 1 [-], got ${phiM}`);
  const eta = requirePositive('intrinsicViscosity', input.intrinsicViscosity, '-');
  if (phi >= phiM) return Number.POSITIVE_INFINITY;
  return mu * (1 - phi / phiM) ** (-eta * phiM);
}
