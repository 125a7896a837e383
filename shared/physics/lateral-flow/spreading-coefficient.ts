import { requireFinite } from '../groups/require-finite';

/**
 * Spreading coefficient of a liquid on a solid, S = σ_s − σ_l − σ_sl.
 *
 * ## Method
 * Difference between the surface energy of the dry solid and that of the wetted solid (solid–liquid
 * plus liquid–air). S > 0: the liquid spreads completely; S < 0: it stands at a finite contact angle,
 * cos θ = 1 + S/σ_l (Young).
 *
 * ## References
 * - Harkins W. D., Feldman A. (1922) "Films. The spreading of liquids and the spreading coefficient",
 *   J. Am. Chem. Soc. 44(12), 2665–2685. doi:10.1021/ja01433a001
 * - de Gennes P.-G. (1985) "Wetting: statics and dynamics", Rev. Mod. Phys. 57(3), 827–863, eq. 1.1.
 *   doi:10.1103/RevModPhys.57.827
 *
 * @param input.solidSurfaceEnergy - σ_s, solid–air [N/m]
 * @param input.liquidSurfaceTension - σ_l, liquid–air [N/m]
 * @param input.interfacialTension - σ_sl, solid–liquid [N/m]
 * @returns spreading coefficient S [N/m]
 * @example spreadingCoefficient({ solidSurfaceEnergy: 0.032, liquidSurfaceTension: 0.025, interfacialTension: 0.005 }) // 0.002
 */
export function spreadingCoefficient(input: {
  solidSurfaceEnergy: number;
  liquidSurfaceTension: number;
  interfacialTension: number;
}): number {
  const s = requireFinite('solidSurfaceEnergy', input.solidSurfaceEnergy, 'N/m');
  const l = requireFinite('liquidSurfaceTension', input.liquidSurfaceTension, 'N/m');
  const sl = requireFinite('interfacialTension', input.interfacialTension, 'N/m');
  return s - l - sl;
}
