import { requirePositive } from '../groups/require-positive';

/**
 * Gas-side mass-transfer coefficient from a heat-transfer coefficient by the Chilton–Colburn
 * analogy.
 *
 * ## Method
 * j_H = j_D gives h/(ρ c_p k_m) = Le^(2/3), so k_m = h / (ρ_air c_p,air Le^(2/3)) with the Lewis
 * number Le = α_air / D_vapour,air. With Le = 1 it is the Lewis relation k_m = h/(ρ c_p). Valid for
 * the same geometry and flow on both sides of the analogy, 0.6 < Sc < 3000, 0.6 < Pr < 100, and
 * low mass-transfer rates (no blowing correction).
 *
 * ## References
 * - Chilton T.H., Colburn A.P. (1934) "Mass transfer (absorption) coefficients: prediction from
 *   data on heat transfer and fluid friction", Ind. Eng. Chem. 26(11):1183–1187. doi:10.1021/ie50299a012
 * - Bergman T.L., Lavine A.S., Incropera F.P., DeWitt D.P. (2011) "Fundamentals of Heat and Mass
 *   Transfer", 7th ed., Wiley, §6.7.2 eq. 6.92.
 *
 * @param input.heatTransferCoefficient - h [W/(m²·K)], ≥ 0
 * @param input.airDensity - ρ_air [kg/m³], > 0
 * @param input.airHeatCapacity - c_p,air [J/(kg·K)], > 0
 * @param input.airThermalDiffusivity - α_air [m²/s], > 0
 * @param input.vapourDiffusivity - D of the solvent vapour in air [m²/s], > 0
 * @returns mass-transfer coefficient k_m [m/s]
 * @example chiltonColburnMassTransfer({ heatTransferCoefficient: 50, airDensity: 1, airHeatCapacity: 1000, airThermalDiffusivity: 2.5e-5, vapourDiffusivity: 1e-5 })
 * // ≈ 0.02714 (= 0.05 / 2.5^(2/3))
 */
export function chiltonColburnMassTransfer(input: {
  heatTransferCoefficient: number;
  airDensity: number;
  airHeatCapacity: number;
  airThermalDiffusivity: number;
  vapourDiffusivity: number;
}): number {
  const h = requirePositive('heatTransferCoefficient', input.heatTransferCoefficient, 'W/(m²·K)', { allowZero: true });
  const rho = requirePositive('airDensity', input.airDensity, 'kg/m³');
  const cp = requirePositive('airHeatCapacity', input.airHeatCapacity, 'J/(kg·K)');
  const alpha = requirePositive('airThermalDiffusivity', input.airThermalDiffusivity, 'm²/s');
  const dv = requirePositive('vapourDiffusivity', input.vapourDiffusivity, 'm²/s');
  const lewis = alpha / dv;
  return h / (rho * cp * lewis ** (2 / 3));
}
