import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/**
 * Temperature drop across a liquid layer that carries a steady heat flux q, ΔT = q d / k.
 *
 * ## Method
 * Fourier's law for steady one-dimensional conduction with no heat generated in the liquid:
 * q = k ΔT/d. q is positive upward (from the bottom to the surface), so a heated bottom gives ΔT > 0.
 * With q held fixed, ΔT ∝ d, so Ma ∝ d² and Ra ∝ d⁴.
 *
 * ## References
 * - Bergman T. L. et al. (2011) "Fundamentals of Heat and Mass Transfer", 7th ed., eq. 3.3 (plane wall).
 *
 * @param input.heatFlux - heat flux through the layer, upward positive [W/m²]
 * @param input.depth - d [m], > 0
 * @param input.conductivity - k [W/(m·K)], > 0
 * @returns ΔT, bottom minus surface [K]
 * @example deltaTFromHeatFlux({ heatFlux: 1000, depth: 50e-6, conductivity: 0.15 }) // ≈ 0.3333
 */
export function deltaTFromHeatFlux(input: { heatFlux: number; depth: number; conductivity: number }): number {
  const q = requireFinite('heatFlux', input.heatFlux, 'W/m²');
  const d = requirePositive('depth', input.depth, 'm');
  const k = requirePositive('conductivity', input.conductivity, 'W/(m·K)');
  return (q * d) / k;
}
