/**
 * Public types of QuietLayer's Drying path (single-solvent coating drying in a zoned oven).
 * SI units throughout: m, s, kg, K, Pa, J, W. Volume fractions are plain fractions (40 % → 0.4).
 */
import type { Regime } from '../stability/types';
import type { SolventVentilationCaution } from './solvent-ventilation-caution';

/** Viscosity of the film against its solids volume fraction φ (and optionally temperature). */
export type ViscosityLaw =
  | {
      /** μ = μ_s(T)·(1 − φ/φ_m)^(−[η]φ_m) (Krieger & Dougherty 1959). */
      kind: 'krieger-dougherty';
      /** μ_s, solvent (continuous-phase) viscosity at the reference temperature [Pa·s]. */
      solventViscosity: number;
      /** [η], intrinsic viscosity [-]; 2.5 for hard spheres. */
      intrinsicViscosity: number;
      /** φ_m, maximum packing fraction [-]; ≈ 0.64 for random close packing. */
      maxPackingFraction: number;
      /** Andrade temperature law for μ_s (optional): reference temperature [K]. */
      referenceTemperature?: number;
      /** Andrade activation temperature B in μ_s(T) = μ_s·exp(B(1/T − 1/T_ref)) [K]; 0 = no T-dependence. */
      activationTemperature?: number;
    }
  | {
      /** μ = μ_s(T)·exp(Bφ) (Arrhenius 1887). */
      kind: 'exponential';
      solventViscosity: number;
      /** B [-]. */
      exponent: number;
      referenceTemperature?: number;
      activationTemperature?: number;
    };

/** How the pure solvent's evaporation is described. */
export type SolventVolatility =
  | {
      /** Antoine equation, NIST WebBook form: log₁₀(p/bar) = A − B/(T/K + C). */
      kind: 'antoine';
      a: number;
      /** [K] */
      b: number;
      /** [K] */
      c: number;
      /** Fitted range of the constants [K]; outside it the Drying path adds a warning. */
      validFrom?: number;
      validTo?: number;
    }
  | {
      /** A fixed evaporation rate of the pure solvent (activity 1) in every zone [kg/(m²·s)]. */
      kind: 'fixed-rate';
      evaporationRate: number;
    };

/** The single solvent of the coating. */
export interface DryingSolvent {
  name: string;
  /** Liquid density ρ_s [kg/m³]. */
  density: number;
  /** Latent heat of vaporisation L [J/kg] (taken constant). */
  latentHeat: number;
  /** Molar mass M [kg/mol]. */
  molarMass: number;
  volatility: SolventVolatility;
  /** Solvent diffusivity in the wet film at φ = 0, D₀ [m²/s]. */
  diffusivity: number;
  /** b in D = D₀·exp(−bφ) [-] (free-volume-like fall of D as the film dries); default 0. */
  diffusivitySolidsExponent?: number;
  /** Diffusivity of the solvent vapour in air [m²/s]; needed when a zone's k_m comes from the Chilton–Colburn analogy. */
  vapourDiffusivityInAir?: number;
  /** Lower flammable limit as a volume fraction [-] (1.1 vol % → 0.011). */
  lowerFlammableLimit: number;
}

/** Properties of the wet film used in the energy balance and the dimensionless groups (taken constant). */
export interface DryingFilm {
  /** ρ [kg/m³] */
  density: number;
  /** c_p [J/(kg·K)] */
  heatCapacity: number;
  /** k [W/(m·K)] */
  conductivity: number;
  /** β [1/K] */
  expansion: number;
  /** σ [N/m] */
  surfaceTension: number;
  /** dσ/dT [N/(m·K)], usually negative. */
  surfaceTensionTemperatureSlope: number;
  /** dσ/dψ, change of σ per unit solvent volume fraction [N/m]; negative when the solvent's σ is below the solids'. */
  surfaceTensionConcentrationSlope: number;
}

/** One oven zone. */
export interface OvenZone {
  name?: string;
  /** Zone length [m] (line transport). */
  length?: number;
  /** Time in the zone [s] (schedule transport). */
  duration?: number;
  /** Air temperature [K]. */
  airTemperature: number;
  /** Heat-transfer coefficient on the coated face [W/(m²·K)]. */
  heatTransferCoefficient: number;
  /** Heat-transfer coefficient on the back face [W/(m²·K)] (thermal-mass substrate only); default 0. */
  backHeatTransferCoefficient?: number;
  /** Gas-side mass-transfer coefficient k_m [m/s]; default from the Chilton–Colburn analogy. */
  massTransferCoefficient?: number;
  /** Solvent vapour concentration in the zone air c_∞ [kg/m³]; default 0 (fresh air). */
  ambientVapourConcentration?: number;
}

/** How time maps onto the oven. */
export type OvenTransport =
  | { kind: 'line'; /** [m/s] */ lineSpeed: number; /** coated width [m], for zone solvent loads and air */ webWidth?: number }
  | { kind: 'schedule' };

/** What the film sits on. */
export type DryingSubstrate =
  | { kind: 'held'; /** [K] */ temperature: number }
  | { kind: 'thermal-mass'; /** ρc·thickness of the substrate [J/(m²·K)] */ arealHeatCapacity: number; /** [K] */ initialTemperature: number };

/** Air properties for the Chilton–Colburn analogy (evaluate at a mean film temperature). */
export interface DryingAir {
  /** [kg/m³] */
  density: number;
  /** [J/(kg·K)] */
  heatCapacity: number;
  /** [m²/s] */
  thermalDiffusivity: number;
}

/** Everything a Drying path needs. */
export interface DryingPathInput {
  /** Initial wet thickness h₀ [m]. */
  wetThickness: number;
  /** Initial solids volume fraction φ₀ (volume solids) [-]. */
  solidsFraction: number;
  solvent: DryingSolvent;
  film: DryingFilm;
  viscosity: ViscosityLaw;
  oven: { transport: OvenTransport; zones: readonly OvenZone[] };
  substrate: DryingSubstrate;
  /** Needed when any zone omits massTransferCoefficient. */
  air?: DryingAir;
  /** Film counts as frozen above this viscosity [Pa·s]; default 1000. */
  freezeViscosity?: number;
  /** Film counts as frozen above this solids fraction [-]; default φ_m (Krieger–Dougherty) or none. */
  freezeSolidsFraction?: number;
  /** 'flat' (default) or 'deformable' surface (passes crispation and Bond numbers to the solver). */
  surface?: 'flat' | 'deformable';
  /** Continuous solvent-vapour monitoring and control installed (50 % instead of 25 % LFL). */
  continuousSolventMonitoring?: boolean;
  /** Number of points on the plotting grid (≥ 2); default 121. */
  gridPoints?: number;
  /** Integrator relative tolerance; default 1e-8. */
  rtol?: number;
}

/** Time series on the plotting grid (all arrays the same length). A margin of Infinity means no stationary onset is possible (JSON.stringify writes it as null). */
export interface DryingSeries {
  /** [s] */
  time: number[];
  /** Position along the oven, line speed × t [m]; null in schedule mode. */
  position: number[] | null;
  zoneIndex: number[];
  /** Wet thickness h [m]. */
  thickness: number[];
  /** Solids volume fraction φ [-]. */
  solidsFraction: number[];
  /** [Pa·s] (Infinity when jammed). */
  viscosity: number[];
  /** [K] */
  filmTemperature: number[];
  /** Evaporation flux [kg/(m²·s)]. */
  evaporationFlux: number[];
  /** Temperature drop across the film, bottom minus top [K]. */
  deltaT: number[];
  /** Solvent volume-fraction difference across the film, bottom minus top [-]. */
  deltaC: number[];
  rayleigh: number[];
  thermalMarangoni: number[];
  solutalMarangoni: number[];
  /** Film thermal Biot number h·d/k [-]. */
  thermalBiot: number[];
  /** Crank's film mass Biot number L [-]. */
  massBiot: number[];
  thermalMargin: number[];
  solutalMargin: number[];
  regime: Regime[];
}

/** Something that happens along the path. */
export interface DryingEvent {
  kind: 'zone-entry' | 'cells-possible' | 'quiet-again' | 'film-frozen';
  /** [s] */
  time: number;
  /** [m]; null in schedule mode. */
  position: number | null;
  zoneIndex: number;
  /** For cells-possible / quiet-again: which margin crossed 1. */
  drive?: 'solutal' | 'thermal';
  detail: string;
}

/** Per-zone figures. */
export interface DryingZoneSummary {
  index: number;
  name: string;
  /** [s] */
  startTime: number;
  endTime: number;
  residenceTime: number;
  /** [m]; null in schedule mode. */
  startPosition: number | null;
  endPosition: number | null;
  /** Film at entry and exit. */
  thicknessIn: number;
  thicknessOut: number;
  solidsIn: number;
  solidsOut: number;
  filmTemperatureOut: number;
  maxFilmTemperature: number;
  /** Gas-side mass-transfer coefficient used [m/s]; NaN for a fixed-rate solvent. */
  massTransferCoefficient: number;
  /** Solvent lost per unit area in the zone [kg/m²]. */
  solventEvaporatedPerArea: number;
  /** Solvent evaporated across the web [kg/s] and as liquid [L/min]; null without line speed and web width. */
  solventMassRate: number | null;
  solventLitresPerMinute: number | null;
  /** Smallest margins in the zone (on the grid). */
  minThermalMargin: number;
  minSolutalMargin: number;
  /** Fresh-air caution; null without line speed and web width. */
  ventilation: SolventVentilationCaution | null;
}

/** The cell verdict for the whole path. */
export type DryingVerdict = 'quiet' | 'cells-die-out' | 'pattern-possible' | 'pattern-expected';

/** Result of computeDryingPath. */
export interface DryingPathResult {
  series: DryingSeries;
  events: DryingEvent[];
  zones: DryingZoneSummary[];
  onset: {
    /** First time a margin falls below 1 [s]; null if never. */
    cellsPossibleAt: number | null;
    drive: 'solutal' | 'thermal' | null;
    /** First time the film freezes [s]; null if it does not freeze in the oven. */
    frozenAt: number | null;
    frozenBy: 'viscosity' | 'solids' | null;
    /** Smallest margins along the path [-]. */
    minThermalMargin: number;
    minSolutalMargin: number;
    /** Growth-time scale at the smallest margin [s]; null if no margin falls below 1. */
    growthTime: number | null;
    /** N_grow = ∫ s dt over the unfrozen time with a margin below 1 [-] (e-folds of growth). */
    growthExponent: number;
    /** N_decay = ∫ |s| dt after the last return to quiet, up to the freeze or exit [-] (e-folds of decay). */
    decayExponent: number;
    verdict: DryingVerdict;
    verdictText: string;
  };
  massBalance: {
    /** h₀·φ₀ [m]. */
    expectedDryThickness: number;
    /** h·φ at the oven exit [m] (the solids' thickness the integrator carried). */
    modelledDryThickness: number;
    /** |modelled − expected| / expected [-]. */
    relativeError: number;
    /** Film thickness at exit including any residual solvent [m]. */
    exitThickness: number;
    /** Solvent volume fraction left at exit [-]. */
    exitSolventFraction: number;
  };
  warnings: string[];
  stats: { accepted: number; rejected: number; evaluations: number };
}
