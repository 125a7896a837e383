import { MOLAR_GAS_CONSTANT } from '../../units/constants';
import { FE_S_ADSORPTION_PARAMETERS, type SoluteAdsorptionParameters } from './fe-s-adsorption-parameters';

/**
 * Temperature coefficient dγ/dT of a liquid metal with a surface-active solute: its sign sets the
 * direction of the thermocapillary surface flow in a melt pool.
 *
 * ## Method
 * Differentiating γ(T, a) = γ_m° − A(T − T_m) − RTΓ_s ln(1 + K a), K = k₁ exp(−ΔH°/(RT)):
 * dγ/dT = −A − RΓ_s ln(1 + K a) − (K a/(1 + K a))·Γ_s ΔH°/T.
 * With ΔH° < 0 the last term is positive and can outweigh the first two at low temperature and
 * high activity, so dγ/dT turns positive. a → 0 gives −A.
 *
 * ## References
 * - Sahoo P., DebRoy T., McNallan M. J. (1988) Metall. Trans. B 19(3):483–491 (their eq. for
 *   dγ/dT). doi:10.1007/BF02657748
 *
 * @param temperature - surface temperature [K], > 0
 * @param activity - solute activity on the 1 wt % scale, ≥ 0 [wt %]
 * @param parameters - model constants (default Fe–S, Sahoo et al. 1988)
 * @returns dγ/dT [N/(m·K)]
 * @example surfaceTensionTemperatureDerivative(1850, 0) // -4.3e-4
 */
export function surfaceTensionTemperatureDerivative(
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
  const ka = p.segregationEntropyFactor * activity * Math.exp(-p.adsorptionEnthalpy / (R * temperature));
  return (
    -p.pureTemperatureCoefficient -
    R * p.saturationSurfaceExcess * Math.log1p(ka) -
    (ka / (1 + ka)) * ((p.saturationSurfaceExcess * p.adsorptionEnthalpy) / temperature)
  );
}
