import { CELSIUS_ZERO_KELVIN } from '../../units/constants';
import type { DryingPathInput } from './types';

/**
 * Demo data: Larkspur Coatings "Line 2", an INVENTED three-zone primer oven with an INVENTED primer.
 * Larkspur Coatings, its line, product and settings are made up; where a value stands for a real
 * substance it comes from a handbook, cited below, and is marked "from memory — verify" where it
 * was not checked against the source.
 *
 * ## Method
 * Pure data, no computation beyond unit conversion (°C → K by +273.15 exactly, m/min → m/s by /60).
 * - Line: 30 m/min, 1.2 m coated width (INVENTED); zones 4 m / 6 m / 6 m at 60 / 90 / 120 °C
 *   (INVENTED), so residence times 8 / 12 / 12 s. Heat-transfer coefficients 40 / 60 / 80 W/(m²·K) on
 *   each face are a STATED ASSUMPTION (a floatation dryer blowing both faces), inside the 50–300
 *   W/(m²·K) band usually quoted for impingement (from memory — verify; use the correlations reviewed by
 *   Polat 1993 for a real oven). k_m comes from the Chilton–Colburn analogy.
 * - Primer "PR-2" (INVENTED): 40 µm wet, 35 % volume solids, in an INVENTED single-solvent thinner that
 *   carries toluene's handbook properties:
 *   · Antoine (NIST WebBook, toluene, log₁₀ bar/K form, fitted 308.52–384.66 K after Williamham,
 *     Taylor et al. 1945): A 4.07827, B 1343.943 K, C −53.773 K.
 *   · Molar mass 92.141 g/mol (C₇H₈ from IUPAC standard atomic weights).
 *   · Enthalpy of vaporisation 38.0 kJ/mol at 298 K (NIST WebBook) → 412.4 kJ/kg.
 *   · Liquid density 866.9 kg/m³ at 20 °C (CRC Handbook; from memory — verify).
 *   · Viscosity 0.56 mPa·s at 25 °C (CRC Handbook; from memory — verify).
 *   · Lower flammable limit 1.1 vol % (NIOSH Pocket Guide to Chemical Hazards, toluene).
 *   · Vapour diffusivity in air 8.6×10⁻⁶ m²/s near 25 °C (from memory — verify).
 *   · Surface tension 28.52 mN/m at 20 °C (Adamson & Gast 1997, table); the film's σ 30 mN/m,
 *     dσ/dT −0.1 mN/(m·K) and dσ/dψ −12 mN/m are INVENTED (resin σ above the solvent's).
 * - Viscosity law: exponential, μ = 0.56 mPa·s·exp(18 φ) (INVENTED fit: ≈ 0.3 Pa·s at 35 % solids).
 * - Solvent diffusivity in the film: D = 10⁻⁹ m²/s·exp(−4φ) (INVENTED, free-volume-like fall).
 * - Film: ρ 1100 kg/m³, c_p 1800 J/(kg·K), k 0.16 W/(m·K), β 10⁻³ 1/K (INVENTED, typical of a
 *   solvent-borne resin solution).
 * - Web: 50 µm PET, ρc·thickness = 1390 kg/m³ × 1170 J/(kg·K) × 50 µm ≈ 81 J/(m²·K) (polyester
 *   handbook values, from memory — verify), entering at 25 °C.
 * - Air (for Chilton–Colburn) at 350 K: ρ 0.9950 kg/m³, c_p 1009 J/(kg·K), α 29.9×10⁻⁶ m²/s
 *   (Bergman et al. 2011, Fundamentals of Heat and Mass Transfer, 7th ed., Table A.4).
 *
 * ## References
 * - Linstrom P.J., Mallard W.G. (eds.) NIST Chemistry WebBook, SRD 69, toluene. doi:10.18434/T4D303
 * - NIOSH Pocket Guide to Chemical Hazards, "Toluene" (LEL 1.1 %).
 * - Bergman T.L., Lavine A.S., Incropera F.P., DeWitt D.P. (2011) Fundamentals of Heat and Mass
 *   Transfer, 7th ed., Wiley, Table A.4.
 * - Adamson A.W., Gast A.P. (1997) Physical Chemistry of Surfaces, 6th ed., Wiley.
 * - Polat S. (1993) Drying Technology 11(6):1147–1176. doi:10.1080/07373939308916894
 *
 * @returns the demo Drying path input (SI units), a fresh object on every call
 * @example demoLine2DryingInput().oven.zones.length // 3
 */
export function demoLine2DryingInput(): DryingPathInput {
  const kelvin = (celsius: number): number => celsius + CELSIUS_ZERO_KELVIN;
  return {
    wetThickness: 40e-6,
    solidsFraction: 0.35,
    solvent: {
      name: 'PR-2 thinner (INVENTED blend; toluene handbook values)',
      density: 866.9,
      latentHeat: 38.0e3 / 0.092141,
      molarMass: 0.092141,
      volatility: { kind: 'antoine', a: 4.07827, b: 1343.943, c: -53.773, validFrom: 308.52, validTo: 384.66 },
      diffusivity: 1e-9,
      diffusivitySolidsExponent: 4,
      vapourDiffusivityInAir: 8.6e-6,
      lowerFlammableLimit: 0.011,
    },
    film: {
      density: 1100,
      heatCapacity: 1800,
      conductivity: 0.16,
      expansion: 1e-3,
      surfaceTension: 0.030,
      surfaceTensionTemperatureSlope: -1e-4,
      surfaceTensionConcentrationSlope: -0.012,
    },
    viscosity: { kind: 'exponential', solventViscosity: 0.56e-3, exponent: 18 },
    oven: {
      transport: { kind: 'line', lineSpeed: 30 / 60, webWidth: 1.2 },
      zones: [
        { name: 'Zone 1', length: 4, airTemperature: kelvin(60), heatTransferCoefficient: 40, backHeatTransferCoefficient: 40 },
        { name: 'Zone 2', length: 6, airTemperature: kelvin(90), heatTransferCoefficient: 60, backHeatTransferCoefficient: 60 },
        { name: 'Zone 3', length: 6, airTemperature: kelvin(120), heatTransferCoefficient: 80, backHeatTransferCoefficient: 80 },
      ],
    },
    substrate: { kind: 'thermal-mass', arealHeatCapacity: 1390 * 1170 * 50e-6, initialTemperature: kelvin(25) },
    air: { density: 0.995, heatCapacity: 1009, thermalDiffusivity: 29.9e-6 },
  };
}
