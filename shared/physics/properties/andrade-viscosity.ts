import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/** Parameters of the Andrade (Arrhenius) viscosity law μ = A·exp(B/T). */
export interface AndradeViscosityLaw {
  /** Prefactor A [Pa·s], > 0. */
  readonly prefactor: number;
  /** Activation temperature B = E_a/R [K]. */
  readonly activationTemperature: number;
}

/**
 * Viscosity of a liquid from the Andrade (Arrhenius-type) law, μ(T) = A·exp(B/T).
 *
 * ## Method
 * ln μ is linear in 1/T; B = E_a/R with E_a an activation energy of viscous flow. Good for most
 * simple liquids over a few tens of kelvin; it does not capture the curvature near the glass
 * transition (use a Vogel-type law there). Fit A and B from data with {@link fitAndradeViscosity}.
 *
 * ## References
 * - Andrade E. N. da C. (1930) "The viscosity of liquids", Nature 125, 309–310. doi:10.1038/125309b0
 * - Reid R. C., Prausnitz J. M., Poling B. E. (1987) "The Properties of Gases and Liquids", 4th ed.,
 *   McGraw-Hill, §9-10 (liquid viscosity, eq. 9-10.1).
 *
 * @param law - prefactor A [Pa·s] and activation temperature B [K]
 * @param temperature - absolute temperature T [K], > 0
 * @returns dynamic viscosity [Pa·s]
 * @example andradeViscosity({ prefactor: 1e-6, activationTemperature: 2000 }, 300) // ≈ 7.86e-4
 */
export function andradeViscosity(law: AndradeViscosityLaw, temperature: number): number {
  const a = requirePositive('prefactor', law.prefactor, 'Pa·s');
  const b = requireFinite('activationTemperature', law.activationTemperature, 'K');
  const T = requirePositive('temperature', temperature, 'K');
  return a * Math.exp(b / T);
}
