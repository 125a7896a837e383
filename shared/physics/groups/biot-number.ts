import { requirePositive } from './require-positive';

/**
 * Biot number of the layer's top surface, Bi = h d / k.
 *
 * ## Method
 * Ratio of the heat carried away from the surface (coefficient h) to conduction through the liquid
 * depth; Bi = 0 is an insulating top, Bi → ∞ a top held at fixed temperature. The perturbation
 * boundary condition DΘ + Bi Θ = 0 uses this definition.
 *
 * ## References
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4, 489–500 (his L = h d / k). doi:10.1017/S0022112058000616
 * - Bergman T. L. et al. (2011) "Fundamentals of Heat and Mass Transfer", 7th ed., eq. 5.9.
 *
 * @param input.heatTransfer - surface heat-transfer coefficient h [W/(m²·K)], ≥ 0
 * @param input.depth - layer depth d [m], > 0
 * @param input.conductivity - liquid thermal conductivity k [W/(m·K)], > 0
 * @returns Biot number [-]
 * @example biotNumber({ heatTransfer: 100, depth: 50e-6, conductivity: 0.15 }) // ≈ 0.0333
 */
export function biotNumber(input: { heatTransfer: number; depth: number; conductivity: number }): number {
  const h = requirePositive('heatTransfer', input.heatTransfer, 'W/(m²·K)', { allowZero: true });
  const d = requirePositive('depth', input.depth, 'm');
  const k = requirePositive('conductivity', input.conductivity, 'W/(m·K)');
  return (h * d) / k;
}
