import { requirePositive } from './require-positive';

/**
 * Galileo number of a layer, Ga = g d³ / (ν κ) (= Bo/Cr).
 *
 * ## Method
 * Gravity against viscous and thermal damping; the long-wave deformational threshold of a layer with
 * a Biot top is Ma_LW = (2/3)·Ga·(1 + Bi).
 *
 * ## References
 * - VanHook S. J., Schatz M. F., Swift J. B., McCormick W. D., Swinney H. L. (1997) "Long-wavelength
 *   surface-tension-driven Bénard convection: experiment and theory", J. Fluid Mech. 345, 45–78.
 *   doi:10.1017/S0022112097006101
 *
 * @param input.gravity - g [m/s²], ≥ 0
 * @param input.depth - d [m], > 0
 * @param input.kinematicViscosity - ν [m²/s], > 0
 * @param input.thermalDiffusivity - κ [m²/s], > 0
 * @returns Galileo number [-]
 * @example galileoNumber({ gravity: 9.81, depth: 1e-4, kinematicViscosity: 1e-5, thermalDiffusivity: 1e-7 }) // ≈ 9.81
 */
export function galileoNumber(input: {
  gravity: number;
  depth: number;
  kinematicViscosity: number;
  thermalDiffusivity: number;
}): number {
  const g = requirePositive('gravity', input.gravity, 'm/s²', { allowZero: true });
  const d = requirePositive('depth', input.depth, 'm');
  const nu = requirePositive('kinematicViscosity', input.kinematicViscosity, 'm²/s');
  const kappa = requirePositive('thermalDiffusivity', input.thermalDiffusivity, 'm²/s');
  return (g * d ** 3) / (nu * kappa);
}
