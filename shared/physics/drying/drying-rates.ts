import { MOLAR_GAS_CONSTANT } from '../../units/constants';
import { antoineVapourPressure } from './antoine-vapour-pressure';
import { evaporationFlux } from './evaporation-flux';
import type { PreparedDryingPath, PreparedZone } from './prepared-drying-path';

/** Rates of change and surface fluxes of a drying film at one instant. */
export interface DryingRates {
  /** d/dt of [h, φ, T_f] [m/s, 1/s, K/s]. */
  derivative: [number, number, number];
  /** Evaporation flux ṁ [kg/(m²·s)]. */
  flux: number;
  /** Crank's film mass Biot number L = G·h/(ρ_s D) [-]. */
  massBiot: number;
  /** Solvent diffusivity in the film at this solids fraction [m²/s]. */
  diffusivity: number;
  /** Saturation vapour pressure at T_f [Pa] (NaN for a fixed-rate solvent). */
  vapourPressure: number;
  /** Net heat flux conducted upward through the film (bottom to surface) [W/m²]. */
  upwardHeatFlux: number;
}

/**
 * Right-hand side of the Drying path model: how thickness, solids fraction and film temperature
 * change at one instant in one zone.
 *
 * ## Method
 * State y = [h, φ, T_f]. Solids are conserved (h·φ constant) and volumes add, so
 *   dh/dt = −ṁ/ρ_s,   dφ/dt = φ·ṁ/(ρ_s h).
 * ṁ from {@link evaporationFlux}: gas-side conductance G = k_m·M·p_sat(T_f)/(R·T_f) with p_sat from
 * the Antoine equation (or G = the stated fixed rate), back-flux A = k_m·c_∞, activity ≈ solvent
 * volume fraction ψ = 1 − φ, and the in-film diffusion resistance (Crank's L) in series; the
 * solvent diffusivity is D = D₀·exp(−bφ).
 * Energy (film and substrate lumped at one temperature, valid while the film and substrate Biot
 * numbers are ≪ 1): (ρc h + C_sub)·dT/dt = (h_top + h_back)(T_air − T) − ṁL. A 'held' substrate
 * pins T_f to its temperature (dT/dt = 0). The heat conducted upward through the film is the mean
 * of the flux leaving its base and the flux its surface needs:
 *   q_top = ṁL − h_top(T_air − T),  q_base = h_back(T_air − T) − C_sub·dT/dt  (held: q = q_top),
 * and ΔT = q·h/k. With air on the coated face only, q = −(C_sub + ρc h/2)·dT/dt: negative
 * (heated from above, thermally stable) while the web heats up and ≈ 0 at the wet-bulb state. A held
 * (e.g. heated-drum) substrate that supplies the latent heat gives the base-state relation
 * ΔT = ṁ L h/k when the air adds nothing (T_air = T_f).
 *
 * ## References
 * - Crank J. (1975) "The Mathematics of Diffusion", 2nd ed., §4.3.2 (surface evaporation, L).
 * - Bergman T.L. et al. (2011) "Fundamentals of Heat and Mass Transfer", 7th ed., §5.3 (lumped
 *   capacitance, Bi ≪ 1) and §6.7 (convective mass transfer).
 * - Hung J.Y., Wimberger R.J., Mujumdar A.S., "Drying of coated webs", Handbook of Industrial Drying,
 *   ch. 40 (heat and mass balances on a coated web in a dryer).
 *
 * @param path - the prepared Drying path
 * @param zone - the zone the film is in
 * @param y - state [h [m], φ [-], T_f [K]]
 * @returns derivative, flux, Crank's L, diffusivity, vapour pressure and upward heat flux
 * @example
 * const path = prepareDryingPath(demoLine2DryingInput());
 * dryingRates(path, path.zones[0], [40e-6, 0.35, 298.15]).flux
 * // ≈ 1.341e-3 kg/(m²·s) (toluene-like solvent, p_sat ≈ 3.79 kPa at 25 °C, Crank's L ≈ 0.458)
 */
export function dryingRates(path: PreparedDryingPath, zone: PreparedZone, y: readonly number[]): DryingRates {
  const { solvent, film, substrate } = path.input;
  const h = y[0];
  const phi = Math.min(1, Math.max(0, y[1]));
  const temperature = y[2];
  if (!(h > 0)) throw new RangeError(`film thickness became ${h} m during integration`);
  if (!(temperature > 0)) throw new RangeError(`film temperature became ${temperature} K during integration`);
  const psi = 1 - phi;
  const diffusivity = solvent.diffusivity * Math.exp(-(solvent.diffusivitySolidsExponent ?? 0) * phi);

  let conductance: number;
  let vapourPressure = Number.NaN;
  if (solvent.volatility.kind === 'antoine') {
    vapourPressure = antoineVapourPressure(temperature, solvent.volatility);
    conductance = (zone.massTransferCoefficient * solvent.molarMass * vapourPressure) / (MOLAR_GAS_CONSTANT * temperature);
  } else {
    conductance = solvent.volatility.evaporationRate;
  }
  const evap = evaporationFlux({
    gasSideConductance: conductance,
    ambientBackFlux: zone.ambientBackFlux,
    solventFraction: psi,
    solventDensity: solvent.density,
    thickness: h,
    diffusivity,
  });
  const flux = evap.flux;
  const dh = -flux / solvent.density;
  const dphi = (phi * flux) / (solvent.density * h);

  const airGain = zone.airTemperature - temperature;
  const latent = flux * solvent.latentHeat;
  const qTop = latent - zone.heatTransferTop * airGain;
  let dT = 0;
  let upwardHeatFlux = qTop;
  if (substrate.kind === 'thermal-mass') {
    const capacity = film.density * film.heatCapacity * h + substrate.arealHeatCapacity;
    dT = ((zone.heatTransferTop + zone.heatTransferBack) * airGain - latent) / capacity;
    const qBase = zone.heatTransferBack * airGain - substrate.arealHeatCapacity * dT;
    upwardHeatFlux = 0.5 * (qTop + qBase);
  }
  return { derivative: [dh, dphi, dT], flux, massBiot: evap.filmMassBiot, diffusivity, vapourPressure, upwardHeatFlux };
}
