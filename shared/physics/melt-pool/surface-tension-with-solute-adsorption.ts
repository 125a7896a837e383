import { MOLAR_GAS_CONSTANT } from '../../units/constants';
import { FE_S_ADSORPTION_PARAMETERS, type SoluteAdsorptionParameters } from './fe-s-adsorption-parameters';

/**
 * Surface tension of a liquid metal holding a surface-active solute (sulfur in iron by default).
 *
 * ## Method
 * γ(T, a) = γ_m° − A(T − T_m) − R·T·Γ_s·ln[1 + k₁·a·exp(−ΔH°/(R·T))] — Gibbs adsorption with a
 * Langmuir isotherm (Szyszkowski form). a → 0 gives the pure-metal line γ_m° − A(T − T_m). Fitted
 * for liquid Fe–S near and above the melting point (≈ 1809 K up to weld-pool temperatures,
 * ~2500 K); outside that range it is an extrapolation.
 *
 * ## References
 * - Sahoo P., DebRoy T., McNallan M. J. (1988) "Surface tension of binary metal–surface active
 *   solute systems under conditions relevant to welding metallurgy", Metall. Trans. B
 *   19(3):483–491. doi:10.1007/BF02657748
 *
 * @param temperature - surface temperature [K], > 0
 * @param activity - solute activity on the 1 wt % scale (sulfur wt %), ≥ 0 [wt %]
 * @param parameters - model constants (default Fe–S, Sahoo et al. 1988)
 * @returns surface tension [N/m]
 * @example surfaceTensionWithSoluteAdsorption(1809, 0) // 1.943
 */
export function surfaceTensionWithSoluteAdsorption(
  temperature: number,
  activity: number,
  parameters: SoluteAdsorptionParameters = FE_S_ADSORPTION_PARAMETERS,
): number {
  if (!(temperature > 0 && Number.isFinite(temperature))) {
    throw new RangeError(`temperature must be a finite number > 0 K, got ${temperature}`);
  }
  if (!(activity >= 0 && Number.isFinite(activity))) {
    throw new RangeError(`activity must be a finite number ≥ 0 wt %, got ${activity}`);
  }
  const p = parameters;
  const R = MOLAR_GAS_CONSTANT;
  const adsorption = p.segregationEntropyFactor * activity * Math.exp(-p.adsorptionEnthalpy / (R * temperature));
  return (
    p.pureSurfaceTensionAtMelting -
    p.pureTemperatureCoefficient * (temperature - p.meltingTemperature) -
    R * temperature * p.saturationSurfaceExcess * Math.log1p(adsorption)
  );
}
