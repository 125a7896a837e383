import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/**
 * Viscosity of a solution against its solids (polymer) volume fraction by an exponential law.
 *
 * ## Method
 * ln(μ/μ_s) = B·φ, i.e. μ = μ_s·exp(B φ), the form Arrhenius proposed for solutions; B is a fitted
 * constant of the formulation [-] (e.g. from two cup or rheometer readings at known solids). It stays
 * finite at every φ, so the film freezes only through the viscosity threshold of the Drying path.
 * Valid over the solids range the constant was fitted on.
 *
 * ## References
 * - Arrhenius S. (1887) "Über die innere Reibung verdünnter wässeriger Lösungen", Z. Phys. Chem.
 *   1:285–298. doi:10.1515/zpch-1887-0133
 *
 * @param input.solventViscosity - μ_s, viscosity at φ = 0 [Pa·s], > 0
 * @param input.solidsFraction - φ [-], ≥ 0
 * @param input.exponent - B [-], finite
 * @returns viscosity μ [Pa·s]
 * @example exponentialViscosity({ solventViscosity: 1e-3, solidsFraction: 0.5, exponent: 10 }) // ≈ 0.1484 (= 1e-3·e⁵)
 */
export function exponentialViscosity(input: { solventViscosity: number; solidsFraction: number; exponent: number }): number {
  const mu = requirePositive('solventViscosity', input.solventViscosity, 'Pa·s');
  const phi = requirePositive('solidsFraction', input.solidsFraction, '-', { allowZero: true });
  const b = requireFinite('exponent', input.exponent, '-');
  return mu * Math.exp(b * phi);
}
