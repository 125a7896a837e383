import type { HeatingMode, ProcessKind, TopKindInput } from '../schemas/layer-checks';

/** Boundary conditions and inputs that a process kind starts from. */
export interface ProcessKindPreset {
  readonly bottom: { readonly mechanics: 'rigid' | 'free'; readonly thermal: 'conducting' | 'insulating' };
  readonly top: TopKindInput;
  readonly deformableSurface: boolean;
  readonly heatingMode: HeatingMode;
  /** Heating modes that make sense for this kind, first = default. */
  readonly heatingModes: readonly HeatingMode[];
  /** Optional inputs worth showing for this kind. */
  readonly showSolute: boolean;
  readonly showLateral: boolean;
  readonly showPanelWidth: boolean;
  /** Plain-words reason for the preset, shown under the form. */
  readonly note: string;
}

/**
 * Sensible starting boundary conditions per process kind.
 *
 * ## Method
 * A wet coat or cast film lies on a metal web, belt or drum (rigid, much better conductor than the
 * liquid → conducting bottom) under air (free surface with surface-tension stress, cooled by
 * evaporation or heated by air: Biot number from h). A melt pool's surface is free and its bottom
 * is the solid–liquid boundary, modelled as rigid and conducting; heat is given as a ΔT.
 * These are the Pearson (1958) and Nield (1964) configurations.
 *
 * ## References
 * - Pearson J.R.A. (1958) On convection cells induced by surface tension. J. Fluid Mech. 4:489–500.
 * - Nield D.A. (1964) Surface tension and buoyancy effects in cellular convection. J. Fluid Mech. 19:341–352.
 *
 * @example processKindPresets['drying-coat'].top // 'surface'
 */
export const processKindPresets: Readonly<Record<ProcessKind, ProcessKindPreset>> = Object.freeze({
  'drying-coat': {
    bottom: { mechanics: 'rigid', thermal: 'conducting' },
    top: 'surface',
    deformableSurface: true,
    heatingMode: 'substrate-air',
    heatingModes: ['substrate-air', 'evaporation', 'heat-flux', 'deltaT'],
    showSolute: true,
    showLateral: true,
    showPanelWidth: true,
    note: 'Wet coat on a metal substrate under oven air: rigid conducting bottom, free surface on top. Drying films cell mainly by solvent-content (solutal) gradients, so give the solvent fraction difference when you know it.',
  },
  'cast-film': {
    bottom: { mechanics: 'rigid', thermal: 'conducting' },
    top: 'surface',
    deformableSurface: true,
    heatingMode: 'evaporation',
    heatingModes: ['evaporation', 'substrate-air', 'heat-flux', 'deltaT'],
    showSolute: true,
    showLateral: true,
    showPanelWidth: true,
    note: 'Solution cast on a belt or drum: rigid conducting bottom, free surface cooled by evaporation.',
  },
  'melt-pool': {
    bottom: { mechanics: 'rigid', thermal: 'conducting' },
    top: 'surface',
    deformableSurface: true,
    heatingMode: 'deltaT',
    heatingModes: ['deltaT', 'heat-flux'],
    showSolute: false,
    showLateral: true,
    showPanelWidth: false,
    note: 'Melt pool: the surface temperature difference along the pool drives the flow; give it as the lateral ΔT over the pool radius.',
  },
  'general-layer': {
    bottom: { mechanics: 'rigid', thermal: 'conducting' },
    top: 'surface',
    deformableSurface: true,
    heatingMode: 'deltaT',
    heatingModes: ['deltaT', 'substrate-air', 'heat-flux', 'evaporation'],
    showSolute: true,
    showLateral: true,
    showPanelWidth: true,
    note: 'Any horizontal liquid layer heated from one side.',
  },
});
