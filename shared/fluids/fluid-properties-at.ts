import type { FluidLaws, FluidPropertiesAt } from './fluid-laws';

/**
 * Evaluate a fluid's properties at a temperature from its stored laws.
 *
 * ## Method
 * - density ρ(T) = ρ_ref·(1 − β(T − T_ref)), the linearised equation of state of the Boussinesq
 *   approximation (Chandrasekhar 1961, §8);
 * - viscosity μ(T) = A·exp(B/T) (Andrade 1930);
 * - surface tension σ(T) = σ_ref + (dσ/dT)(T − T_ref), linear as in Pearson (1958);
 * - k, c_p (or κ), D and dσ/dc constant; κ = k/(ρ c_p), or c_p = k/(ρ κ) when κ is stored;
 *   ν = μ/ρ.
 *
 * ## References
 * - Chandrasekhar S. (1961) Hydrodynamic and Hydromagnetic Stability, Oxford, ch. II §8.
 * - Andrade E.N. da C. (1930) The viscosity of liquids. Nature 125:309–310.
 * - Pearson J.R.A. (1958) On convection cells induced by surface tension. J. Fluid Mech. 4:489–500.
 *
 * @param laws - the fluid's laws [SI]
 * @param temperature - evaluation temperature [K], > 0
 * @returns properties at that temperature [SI]
 * @throws RangeError when T ≤ 0 K or a law gives a non-positive density or surface tension there
 * @example fluidPropertiesAt(water, 293.15).viscosity // ≈ 1.0016e-3 for water's stored law
 */
export function fluidPropertiesAt(laws: FluidLaws, temperature: number): FluidPropertiesAt {
  if (!(temperature > 0)) throw new RangeError(`temperature must be > 0 K, got ${temperature}`);
  const dT = temperature - laws.referenceTemperature;
  const density = laws.density * (1 - laws.expansion * dT);
  if (!(density > 0)) {
    throw new RangeError(`density: the expansion law gives ${density.toPrecision(3)} kg/m³ at ${temperature.toFixed(2)} K; the temperature is far outside the fluid's range`);
  }
  const viscosity = laws.viscosityPreExponential * Math.exp(laws.viscosityActivationTemperature / temperature);
  if (!(viscosity > 0) || !Number.isFinite(viscosity)) {
    throw new RangeError(`viscosity: the viscosity law gives ${viscosity} Pa·s at ${temperature.toFixed(2)} K`);
  }
  const surfaceTension = laws.surfaceTension + laws.surfaceTensionSlope * dT;
  if (!(surfaceTension > 0)) {
    throw new RangeError(`surfaceTension: the linear law gives ${surfaceTension.toPrecision(3)} N/m at ${temperature.toFixed(2)} K; the temperature is far outside the fluid's range`);
  }
  let heatCapacity: number;
  let thermalDiffusivity: number;
  if (laws.heatCapacity !== null) {
    heatCapacity = laws.heatCapacity;
    thermalDiffusivity = laws.conductivity / (density * heatCapacity);
  } else if (laws.thermalDiffusivity !== null) {
    thermalDiffusivity = laws.thermalDiffusivity;
    heatCapacity = laws.conductivity / (density * thermalDiffusivity);
  } else {
    throw new RangeError('heatCapacity: give a heat capacity or a thermal diffusivity');
  }
  return Object.freeze({
    temperature,
    density,
    viscosity,
    kinematicViscosity: viscosity / density,
    surfaceTension,
    surfaceTensionSlope: laws.surfaceTensionSlope,
    conductivity: laws.conductivity,
    heatCapacity,
    thermalDiffusivity,
    expansion: laws.expansion,
    soluteDiffusivity: laws.soluteDiffusivity,
    soluteSurfaceTensionSlope: laws.soluteSurfaceTensionSlope,
  });
}
