import { requirePositive } from '../groups/require-positive';

/** Result of evaporationFlux. */
export interface EvaporationFluxResult {
  /** Solvent mass flux leaving the surface, ≥ 0 [kg/(m²·s)]. */
  flux: number;
  /** Flux the gas side alone would carry at the film's mean solvent fraction [kg/(m²·s)]. */
  gasSideFlux: number;
  /** Film mass Biot number L = G·h/(ρ_s D) [-] (Crank's L): ≪ 1 gas-side controlled, ≫ 1 diffusion-limited. */
  filmMassBiot: number;
  /** Solvent volume fraction at the surface [-]. */
  surfaceSolventFraction: number;
}

/**
 * Solvent evaporation flux from a drying film with the gas-side and in-film resistances in series.
 *
 * ## Method
 * Gas side: ṁ = G·ψ_s − A, where G = k_m·M·p_sat(T)/(R T) is the gas-side conductance per unit
 * solvent activity [kg/(m²·s)], the activity is approximated by the surface solvent volume fraction
 * ψ_s (ideal, Raoult-like in volume fraction — no Flory–Huggins interaction), and A = k_m·c_∞ is
 * the back-flux from solvent vapour already in the oven air. Film side: the slowest mode of
 * desorption from a plane sheet with an impermeable base (Crank 1975, eq. 4.18 with the base as
 * the mid-plane of a sheet of thickness 2h) removes solvent at ṁ = ρ_s·(π²D/(4h))·(ψ̄ − ψ_s).
 * Eliminating ψ_s gives
 *   ṁ = (G ψ̄ − A) / (1 + 4L/π²),  L = G h/(ρ_s D),
 * where L is Crank's surface-evaporation parameter (§4.3.2, eq. 4.53, L = lα/D with α = G/ρ_s).
 * Criterion: L ≪ 1 → gas-side (constant-rate) drying, flux independent of D; L ≫ 1 → falling-rate
 * drying limited by diffusion in the film. The series form reproduces both limits of Crank's exact
 * first eigenvalue (β₁ tan β₁ = L) and interpolates between them. Condensation (G ψ̄ < A) is not
 * modelled: the flux is then 0.
 *
 * ## References
 * - Crank J. (1975) "The Mathematics of Diffusion", 2nd ed., Oxford: Clarendon, §4.3.1 eq. 4.18
 *   (plane sheet, constant surface concentration) and §4.3.2 eqs. 4.53–4.54 (surface evaporation, L).
 * - Bird R.B., Stewart W.E., Lightfoot E.N. (2002) "Transport Phenomena", 2nd ed., Wiley, §22.1
 *   (gas-side mass-transfer coefficients, flux = k·Δc).
 *
 * @param input.gasSideConductance - G = k_m·c_sat [kg/(m²·s)], ≥ 0
 * @param input.ambientBackFlux - A = k_m·c_∞ [kg/(m²·s)], ≥ 0
 * @param input.solventFraction - mean solvent volume fraction ψ̄ in the film [-], in [0, 1]
 * @param input.solventDensity - liquid solvent density ρ_s [kg/m³], > 0
 * @param input.thickness - film thickness h [m], > 0
 * @param input.diffusivity - solvent diffusivity in the film D [m²/s], > 0
 * @returns flux, gas-side flux, Crank's L and the surface solvent fraction
 * @example evaporationFlux({ gasSideConductance: 1e-3, ambientBackFlux: 0, solventFraction: 0.6, solventDensity: 870, thickness: 50e-6, diffusivity: 1e-9 }).flux
 * // ≈ 5.863e-4 (L ≈ 0.0575; 6e-4 / (1 + 4·0.0575/π²): gas-side controlled)
 */
export function evaporationFlux(input: {
  gasSideConductance: number;
  ambientBackFlux: number;
  solventFraction: number;
  solventDensity: number;
  thickness: number;
  diffusivity: number;
}): EvaporationFluxResult {
  const g = requirePositive('gasSideConductance', input.gasSideConductance, 'kg/(m²·s)', { allowZero: true });
  const a = requirePositive('ambientBackFlux', input.ambientBackFlux, 'kg/(m²·s)', { allowZero: true });
  const psi = requirePositive('solventFraction', input.solventFraction, '-', { allowZero: true });
  if (psi > 1) throw new RangeError(`solventFraction must be ≤ 1 [-], got ${psi}`);
  const rho = requirePositive('solventDensity', input.solventDensity, 'kg/m³');
  const h = requirePositive('thickness', input.thickness, 'm');
  const d = requirePositive('diffusivity', input.diffusivity, 'm²/s');
  const filmMassBiot = (g * h) / (rho * d);
  const gasSideFlux = Math.max(0, g * psi - a);
  const flux = gasSideFlux / (1 + (4 * filmMassBiot) / (Math.PI * Math.PI));
  const filmConductance = (rho * Math.PI * Math.PI * d) / (4 * h);
  const surfaceSolventFraction = Math.max(0, Math.min(1, psi - flux / filmConductance));
  return { flux, gasSideFlux, filmMassBiot, surfaceSolventFraction };
}
