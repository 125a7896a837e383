import { STANDARD_GRAVITY } from '../../units/constants';
import { deltaTFromHeatFlux } from '../base-state';
import { biotNumber, bondNumber, crispationNumber, marangoniNumber, rayleighNumber, solutalMarangoniNumber } from '../groups';
import { onsetMargin } from '../stability';
import type { Regime } from '../stability/types';
import { dryingRates } from './drying-rates';
import { filmViscosity } from './film-viscosity';
import type { FilmPoint, MarginTables } from './film-point';
import type { PreparedDryingPath, PreparedZone } from './prepared-drying-path';

/**
 * Buoyancy counts as negligible when (Ra/Ra_c)/(Ma/Ma_c) is below this share; the smallest Ra_c of a
 * rigid conducting bottom under a free top (669.00, Nield 1964, insulating top) keeps it conservative.
 */
const NEGLIGIBLE_BUOYANCY_SHARE = 1e-3;
const SMALLEST_RAYLEIGH_CRITICAL = 669.0;

interface Margin {
  margin: number;
  regime: Regime;
}

function quiet(): Margin {
  return { margin: Number.POSITIVE_INFINITY, regime: 'quiet' };
}

function fromTable(marangoni: number, critical: number): Margin {
  if (!(marangoni > 0)) return quiet();
  const margin = critical / marangoni;
  return { margin, regime: margin >= 1 ? 'quiet' : 'surface-tension-cells' };
}

/**
 * Everything the Drying path reports at one instant: film state, evaporation, the temperature and
 * solvent-content differences across the film, the dimensionless groups and both Onset margins.
 *
 * ## Method
 * Rates from {@link dryingRates}. ΔT = q·h/k with q the heat conducted upward through the film
 * (deltaTFromHeatFlux). Δc = ṁ·h/(ρ_s D): steady diffusion carrying the surface flux ṁ across the
 * film, ρ_s D ∂ψ/∂z = ṁ, integrated over h (the same flux-scaled difference the thermal problem uses
 * for ΔT = q h/k; with an impermeable base the true quasi-steady profile is parabolic and its drop
 * is half this, so Δc is the surface-gradient scale, an upper bound).
 * Groups: Ra = gβΔT h³/(νκ), Ma_T = −(dσ/dT)ΔT h/(μκ), Ma_c = −(dσ/dψ)Δc h/(μD), Bi = h_top·h/k,
 * and the mass Biot number L = G h/(ρ_s D).
 * Thermal margin: rigid conducting bottom, free surface with Biot top. When buoyancy's share
 * (Ra/669)/(Ma_T/Ma_c(Bi)) is below 10⁻³ (669 = the smallest Ra_c for this bottom, so the share is
 * overstated), Nield's near-linear coupling Ra/Ra_c + Ma/Ma_c ≈ 1 says it moves the margin by < 0.1 %,
 * and margin = Ma_c(Bi)/Ma_T from the tabulated critical value; otherwise onsetMargin solves the
 * coupled problem. Solutal margin, by analogy (D for κ, L for Bi, no buoyancy from solvent content):
 * rigid bottom that is impermeable ('insulating'), free surface with Biot number L,
 * margin = Ma_c,crit(L)/Ma_c. With surface 'deformable' both go to onsetMargin with crispation
 * μκ/(σh) (μD/(σh) for solutal) and Bond ρgh²/σ. A negative Ma (heated from above, or solvent
 * raising σ) has no stationary onset: margin Infinity.
 * Growth-rate scale: s ≈ (χ/h²)(Ma/Ma_c − 1) = (χ/h²)(1/λ − 1), χ = D or κ, the larger of the two
 * drives: the linear growth rate of the least-stable mode changes sign at onset and, near it, is
 * proportional to the distance past onset, in units of the diffusive rate χ/h²; far below onset it
 * tends to −χ/h², pure diffusive decay (derived; the O(1) prefactor is not computed, so 1/s is a
 * time scale, not a prediction). Past onset τ_growth = 1/s = (h²/χ)/(Ma/Ma_c − 1).
 *
 * ## References
 * - Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500. doi:10.1017/S0022112058000616
 * - Nield D.A. (1964) J. Fluid Mech. 19:341–352. doi:10.1017/S0022112064000763
 * - Sternling C.V., Scriven L.E. (1959) AIChE J. 5(4):514–523. doi:10.1002/aic.690050421
 * - Tönsmann M., Scharfer P., Schabel W. (2021) Polymers 13(17):2955. doi:10.3390/polym13172955
 *
 * @param path - the prepared Drying path
 * @param zone - the zone the film is in
 * @param y - state [h [m], φ [-], T_f [K]]
 * @param tables - memoised critical-value tables of this path
 * @returns the evaluated point
 * @example
 * const path = prepareDryingPath(demoLine2DryingInput());
 * const tables = { thermal: createCriticalMarangoniTable('conducting'), solutal: createCriticalMarangoniTable('insulating') };
 * evaluateFilmPoint(path, path.zones[0], [40e-6, 0.35, 298.15], tables).solutalMargin
 * // ≈ 0.0471 (Ma_c ≈ 1602 against a critical ≈ 75 at L ≈ 0.458): surface-tension cells
 */
export function evaluateFilmPoint(
  path: PreparedDryingPath,
  zone: PreparedZone,
  y: readonly number[],
  tables: MarginTables,
): FilmPoint {
  const { film, solvent } = path.input;
  const rates = dryingRates(path, zone, y);
  const h = y[0];
  const phi = Math.min(1, Math.max(0, y[1]));
  const temperature = y[2];
  const viscosity = filmViscosity(path.input.viscosity, phi, temperature);
  const kappa = film.conductivity / (film.density * film.heatCapacity);
  const deltaT = deltaTFromHeatFlux({ heatFlux: rates.upwardHeatFlux, depth: h, conductivity: film.conductivity });
  const deltaC = (rates.flux * h) / (solvent.density * rates.diffusivity);
  const thermalBiot = biotNumber({ heatTransfer: zone.heatTransferTop, depth: h, conductivity: film.conductivity });
  const massBiot = rates.massBiot;

  let rayleigh = 0;
  let thermalMarangoni = 0;
  let solutalMarangoni = 0;
  let thermal = quiet();
  let solutal = quiet();
  if (Number.isFinite(viscosity)) {
    rayleigh = rayleighNumber({
      gravity: STANDARD_GRAVITY,
      expansion: film.expansion,
      deltaT,
      depth: h,
      kinematicViscosity: viscosity / film.density,
      thermalDiffusivity: kappa,
    });
    thermalMarangoni = marangoniNumber({
      surfaceTensionSlope: film.surfaceTensionTemperatureSlope,
      deltaT,
      depth: h,
      viscosity,
      thermalDiffusivity: kappa,
    });
    solutalMarangoni = solutalMarangoniNumber({
      surfaceTensionConcentrationSlope: film.surfaceTensionConcentrationSlope,
      concentrationDifference: deltaC,
      depth: h,
      viscosity,
      diffusivity: rates.diffusivity,
    });
    if (path.input.surface === 'deformable') {
      const bond = bondNumber({ density: film.density, gravity: STANDARD_GRAVITY, depth: h, surfaceTension: film.surfaceTension });
      if (rayleigh > 0 || thermalMarangoni > 0) {
        const r = onsetMargin({
          bottom: 'rigid',
          bottomThermal: 'conducting',
          top: 'surface',
          biot: thermalBiot,
          rayleigh,
          marangoni: thermalMarangoni,
          crispation: crispationNumber({ viscosity, thermalDiffusivity: kappa, surfaceTension: film.surfaceTension, depth: h }),
          bond,
        });
        thermal = { margin: r.margin, regime: r.regime };
      }
      if (solutalMarangoni > 0) {
        const r = onsetMargin({
          bottom: 'rigid',
          bottomThermal: 'insulating',
          top: 'surface',
          biot: massBiot,
          rayleigh: 0,
          marangoni: solutalMarangoni,
          crispation: crispationNumber({ viscosity, thermalDiffusivity: rates.diffusivity, surfaceTension: film.surfaceTension, depth: h }),
          bond,
        });
        solutal = { margin: r.margin, regime: r.regime };
      }
    } else {
      const criticalMa = tables.thermal(thermalBiot);
      const buoyancyShare =
        thermalMarangoni > 0 ? (rayleigh / SMALLEST_RAYLEIGH_CRITICAL) / (thermalMarangoni / criticalMa) : Number.POSITIVE_INFINITY;
      if (rayleigh > 0 && !(buoyancyShare < NEGLIGIBLE_BUOYANCY_SHARE)) {
        const r = onsetMargin({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: thermalBiot, rayleigh, marangoni: thermalMarangoni });
        thermal = { margin: r.margin, regime: r.regime };
      } else {
        thermal = fromTable(thermalMarangoni, criticalMa);
      }
      solutal = fromTable(solutalMarangoni, tables.solutal(massBiot));
    }
  }

  const regime: Regime = thermal.margin >= 1 && solutal.margin >= 1 ? 'quiet' : solutal.margin <= thermal.margin ? solutal.regime : thermal.regime;
  const rate = (margin: number, diffusivity: number): number => (diffusivity / (h * h)) * (1 / margin - 1);
  const growthRate = Math.max(rate(thermal.margin, kappa), rate(solutal.margin, rates.diffusivity));

  return {
    thickness: h,
    solidsFraction: phi,
    filmTemperature: temperature,
    viscosity,
    evaporationFlux: rates.flux,
    vapourPressure: rates.vapourPressure,
    deltaT,
    deltaC,
    rayleigh,
    thermalMarangoni,
    solutalMarangoni,
    thermalBiot,
    massBiot,
    thermalMargin: thermal.margin,
    solutalMargin: solutal.margin,
    regime,
    growthRate,
  };
}
