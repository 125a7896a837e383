import { requirePositive } from './require-positive';

/**
 * Mass-transfer Biot number of the layer's top surface, Bi_m = h_m d / D.
 *
 * ## Method
 * The solutal analogue of {@link biotNumber}: the gas-side mass-transfer coefficient h_m [m/s] in
 * place of h/(ρc_p); the boundary condition D ∂c/∂z = −h_m c′ gives DΘ + Bi_m Θ = 0 in
 * the same form as the thermal Biot condition, so the onset solver treats it the same way. Used with
 * {@link solutalMarangoniNumber} (by analogy; see there for the limits).
 *
 * ## References
 * - Sternling C. V., Scriven L. E. (1959) AIChE J. 5(4), 514–523. doi:10.1002/aic.690050421
 * - Bergman T. L. et al. (2011) "Fundamentals of Heat and Mass Transfer", 7th ed., §6.7.2 (the heat and
 *   mass transfer analogy).
 *
 * @param input.massTransferCoefficient - h_m [m/s], ≥ 0
 * @param input.depth - d [m], > 0
 * @param input.diffusivity - D [m²/s], > 0
 * @returns mass-transfer Biot number [-]
 * @example massTransferBiotNumber({ massTransferCoefficient: 1e-6, depth: 50e-6, diffusivity: 1e-10 }) // 500
 */
export function massTransferBiotNumber(input: { massTransferCoefficient: number; depth: number; diffusivity: number }): number {
  const hm = requirePositive('massTransferCoefficient', input.massTransferCoefficient, 'm/s', { allowZero: true });
  const d = requirePositive('depth', input.depth, 'm');
  const D = requirePositive('diffusivity', input.diffusivity, 'm²/s');
  return (hm * d) / D;
}
