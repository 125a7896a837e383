import { requirePositive } from '../groups/require-positive';

/**
 * Péclet number of a melt pool: heat carried by the surface flow against heat conducted. Pe ≫ 1
 * means the flow, and so its direction, shapes the pool.
 *
 * ## Method
 * Pe = u·L/κ with u the surface velocity scale and L the pool half-width.
 *
 * ## References
 * - DebRoy T., David S. A. (1995) "Physical processes in fusion welding", Rev. Mod. Phys.
 *   67(1):85–112, §III. doi:10.1103/RevModPhys.67.85
 *
 * @param velocity - surface velocity scale u [m/s], ≥ 0
 * @param length - pool half-width L [m], > 0
 * @param thermalDiffusivity - κ [m²/s], > 0
 * @returns Péclet number [-]
 * @example meltPoolPecletNumber(1, 3e-3, 5e-6) // 600
 */
export function meltPoolPecletNumber(velocity: number, length: number, thermalDiffusivity: number): number {
  const u = requirePositive('velocity', velocity, 'm/s', { allowZero: true });
  const l = requirePositive('length', length, 'm');
  const kappa = requirePositive('thermalDiffusivity', thermalDiffusivity, 'm²/s');
  return (u * l) / kappa;
}
