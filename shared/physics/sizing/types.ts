import type { LayerDepthOnsets } from './layer-depth-onsets';
import type { CriticalValue, LayerBoundaries, OnsetResult, Regime } from '../stability/types';

/**
 * A liquid layer described by its physical properties and operating point, all in SI.
 * This is what sizing, the evaluate endpoint and the batch command take.
 */
export interface PhysicalLayer extends Omit<LayerBoundaries, 'biot'> {
  /** Density ρ [kg/m³], > 0. */
  readonly density: number;
  /** Dynamic viscosity μ [Pa·s], > 0. */
  readonly viscosity: number;
  /** Thermal conductivity k [W/(m·K)], > 0. */
  readonly conductivity: number;
  /** Specific heat capacity c_p [J/(kg·K)], > 0. */
  readonly heatCapacity: number;
  /** Volumetric expansion coefficient β [1/K] (any sign). */
  readonly expansion: number;
  /** Surface tension σ [N/m], > 0. */
  readonly surfaceTension: number;
  /** dσ/dT [N/(m·K)], negative for ordinary liquids. */
  readonly dSigmaDT: number;
  /** Layer depth d [m], > 0. */
  readonly depth: number;
  /** Temperature drop across the liquid, bottom minus surface [K]; positive when heated from below. */
  readonly deltaT: number;
  /** Heat-transfer coefficient at the top surface h [W/(m²·K)], ≥ 0 (0 = insulating top). */
  readonly heatTransfer: number;
  /** Gravitational acceleration g [m/s²], ≥ 0 (standard gravity 9.80665). */
  readonly gravity: number;
}

/** Every dimensionless group of a physical layer, plus the two diffusivities. */
export interface LayerGroups {
  /** Ra = gβΔT d³/(νκ) [-]. */
  readonly rayleigh: number;
  /** Ma = (−dσ/dT)ΔT d/(μκ) [-]. */
  readonly marangoni: number;
  /** Bi = h d/k [-]. */
  readonly biot: number;
  /** Pr = ν/κ [-]. */
  readonly prandtl: number;
  /** Static Bond number ρgd²/σ [-]. */
  readonly bond: number;
  /** Dynamic Bond number Ra/Ma = ρgβd²/(−dσ/dT) [-] (±Infinity when dσ/dT = 0). */
  readonly dynamicBond: number;
  /** Crispation number μκ/(σd) [-]. */
  readonly crispation: number;
  /** Galileo number gd³/(νκ) [-]. */
  readonly galileo: number;
  /** Thermal diffusivity κ [m²/s]. */
  readonly thermalDiffusivity: number;
  /** Kinematic viscosity ν [m²/s]. */
  readonly kinematicViscosity: number;
}

/** Answer to "what depth bounds the quiet range?": a depth, or why there is none in the range searched. */
export type DepthBound =
  | { readonly found: true; /** The bounding depth [m]. */ readonly depth: number }
  | {
      readonly found: false;
      /**
       * 'quiet-throughout-range': no onset on that side of the current depth within the range searched;
       * 'onset-throughout-range': the mode is active all the way to the end of the range;
       * 'not-applicable': the layer cannot have this bound (e.g. no deformable surface).
       */
      readonly reason: 'quiet-throughout-range' | 'onset-throughout-range' | 'not-applicable';
      /** Depth range searched [m] (NaN when not applicable). */
      readonly searchedFrom: number;
      readonly searchedTo: number;
      /** One plain sentence for people. */
      readonly message: string;
    };

/** Options of the depth searches. */
export interface DepthSearchOptions {
  /** Smallest depth searched [m]; default 1e-7 (0.1 µm). */
  readonly minDepth?: number;
  /** Largest depth searched [m]; default 10. */
  readonly maxDepth?: number;
  /**
   * Solved depths of this same layer to share with other depth searches ({@link LayerDepthOnsets});
   * ignored when made for a different layer. Default: a fresh set for this search.
   */
  readonly depthOnsets?: LayerDepthOnsets;
}

/** Largest temperature drops before onset at the layer's depth (signed like deltaT) [K]. */
export interface DeltaTLimits {
  /** Onset of the flat-surface cellular mode: cellMargin × ΔT [K]; ±Infinity when none. */
  readonly cellular: number;
  /** Onset of the most dangerous mode (deformable surface included): margin × ΔT [K]; ±Infinity when none. */
  readonly mostDangerous: number;
}

/** Everything QuietLayer says about one physical layer. */
export interface LayerEvaluation {
  readonly groups: LayerGroups;
  /** Onset result of the most dangerous mode (deformable surface included on a 'surface' top). */
  readonly onset: OnsetResult;
  /** Pure buoyancy, flat surface (Ma = 0) for these boundaries and Bi. */
  readonly criticalRayleigh: CriticalValue;
  /** Pure thermocapillary, flat surface (Ra = 0); null unless the top is 'surface'. */
  readonly criticalMarangoni: CriticalValue | null;
  /** Most dangerous mode's margin λ* [-] (Infinity when no onset). */
  readonly margin: number;
  /** Flat-surface cellular margin [-]. */
  readonly cellMargin: number;
  readonly regime: Regime;
  /** The regime in QuietLayer's words, e.g. "Surface-tension cells". */
  readonly regimeLabel: string;
  readonly longWave: boolean;
  /** Critical wavenumber of the flat cellular mode [1/d] (NaN when none). */
  readonly criticalWavenumber: number;
  /** Cell wavelength 2πd/k_c [m] (Infinity for k_c = 0, NaN when no onset). */
  readonly wavelength: number;
  /** Centre-to-centre spacing of hexagonal cells 4πd/(√3 k_c) [m]. */
  readonly hexagonSpacing: number;
  /** Depth above which flat cellular onset sets in, ΔT held. */
  readonly maxStableDepth: DepthBound;
  /** Depth below which the long-wave deformational mode sets in; 'not-applicable' unless the top is 'surface'. */
  readonly minStableDepth: DepthBound;
  readonly maxDeltaT: DeltaTLimits;
}

/** Options of {@link quietWindow}. */
export interface QuietWindowOptions {
  /** Smallest and largest depth [m], 0 < depthMin < depthMax. */
  readonly depthMin: number;
  readonly depthMax: number;
  /** Smallest and largest ΔT [K], deltaTMin < deltaTMax (may span 0). */
  readonly deltaTMin: number;
  readonly deltaTMax: number;
  /** Depth samples, 2–2000; default 200. */
  readonly depthPoints?: number;
  /** ΔT samples, 2–2000; default 60. */
  readonly deltaTPoints?: number;
  /** Depth spacing; default 'log'. */
  readonly depthSpacing?: 'log' | 'linear';
  /** Relative accuracy of interpolated margins between solved depths; default 1e-3; 0 = solve every depth. */
  readonly tolerance?: number;
}

/** Quiet window over a depth × ΔT rectangle, ready to plot. Non-finite values are null. */
export interface QuietWindow {
  /** Depth samples [m]. */
  readonly depths: number[];
  /** ΔT samples [K]. */
  readonly deltaTs: number[];
  /** Per depth: ΔT at which flat cellular onset sets in when heated from below [K] (null when none). */
  readonly cellOnsetDeltaT: (number | null)[];
  /** Per depth: ΔT at which the long-wave deformational mode sets in, heated from below [K] (null when none or flat). */
  readonly longWaveOnsetDeltaT: (number | null)[];
  /** Per depth: ΔT at onset of the most dangerous mode, heated from below [K]. */
  readonly onsetDeltaT: (number | null)[];
  /** The same three curves for heating from above (negative ΔT) [K]; empty arrays when the range has no negative ΔT. */
  readonly cellOnsetDeltaTFromAbove: (number | null)[];
  readonly longWaveOnsetDeltaTFromAbove: (number | null)[];
  readonly onsetDeltaTFromAbove: (number | null)[];
  /** Margin of the most dangerous mode, margin[iDeltaT][iDepth] [-]; null where infinite (no onset, or ΔT = 0). */
  readonly margin: (number | null)[][];
  /** True where the most dangerous mode is long-wave, same indexing as margin. */
  readonly longWave: boolean[][];
  /** The layer's own operating point. */
  readonly operatingPoint: { readonly depth: number; readonly deltaT: number; readonly margin: number | null };
  /** How many depth solves were made (per heating direction, summed); the rest were interpolated. */
  readonly solvedDepths: number;
}
