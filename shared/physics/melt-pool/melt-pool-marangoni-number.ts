import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/**
 * Surface-tension Marangoni number of a melt pool: strength of the thermocapillary drive along
 * the pool surface against viscous and thermal diffusion. Unlike the layer Marangoni number it
 * uses the pool's lateral size and the magnitude of dγ/dT, because here the temperature
 * difference runs along the surface and either sign of dγ/dT drives flow.
 *
 * ## Method
 * Ma = |dγ/dT|·ΔT·L/(μ·κ), ΔT = peak surface temperature − pool-edge (melting) temperature,
 * L = pool half-width (or radius).
 *
 * ## References
 * - DebRoy T., David S. A. (1995) "Physical processes in fusion welding", Rev. Mod. Phys.
 *   67(1):85–112, §III (dimensionless numbers of the weld pool). doi:10.1103/RevModPhys.67.85
 *
 * @param input.surfaceTensionSlope - dγ/dT [N/(m·K)], either sign
 * @param input.temperatureDifference - ΔT along the surface [K], ≥ 0
 * @param input.length - pool half-width L [m], > 0
 * @param input.viscosity - dynamic viscosity μ [Pa·s], > 0
 * @param input.thermalDiffusivity - κ [m²/s], > 0
 * @returns Marangoni number [-]
 * @example meltPoolMarangoniNumber({ surfaceTensionSlope: -4e-4, temperatureDifference: 1000,
 *   length: 3e-3, viscosity: 6e-3, thermalDiffusivity: 5e-6 }) // 40000
 */
export function meltPoolMarangoniNumber(input: {
  readonly surfaceTensionSlope: number;
  readonly temperatureDifference: number;
  readonly length: number;
  readonly viscosity: number;
  readonly thermalDiffusivity: number;
}): number {
  const slope = requireFinite('surfaceTensionSlope', input.surfaceTensionSlope, 'N/(m·K)');
  const dT = requirePositive('temperatureDifference', input.temperatureDifference, 'K', { allowZero: true });
  const length = requirePositive('length', input.length, 'm');
  const mu = requirePositive('viscosity', input.viscosity, 'Pa·s');
  const kappa = requirePositive('thermalDiffusivity', input.thermalDiffusivity, 'm²/s');
  return (Math.abs(slope) * dT * length) / (mu * kappa);
}
