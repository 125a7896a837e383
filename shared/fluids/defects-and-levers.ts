import type { LayerEvaluation as PhysicsEvaluation } from '../physics/sizing/types';
import type { Lever, ProcessKind } from '../schemas/layer-checks';
import { formatQuantity } from '../units/format-quantity';
import { formatDepth } from './mechanism-sentence';

interface DefectInput {
  processKind: ProcessKind;
  /** Margin used for the verdict (null = infinite). */
  margin: number | null;
  alertThreshold: number;
  mechanism: string;
  wavelength: number | null;
  hasLateral: boolean;
  surfaceTensionSlope: number;
}

/**
 * The defects a practitioner should expect, in the trade's words.
 *
 * ## Method
 * Only when the margin is below the alert threshold. Surface-tension or mixed cells in a coat or
 * cast film freeze into a hexagonal texture (Bénard cells, floating when pigments separate); cells
 * drawn out on a moving web read as silking; cells ≥ 0.5 mm read as orange peel. Long-wave
 * thinning opens dry spots. A lateral ΔT pulls liquid along the surface toward higher σ: at panel
 * and web edges this is picture framing. Melt pools: the sign of dσ/dT sets the flow direction.
 *
 * ## References
 * - Gooch J.W. (ed.) (2011) Encyclopedic Dictionary of Polymers, "Benard (vortex) cell", after Weldon D.G. (2001)
 *   Failure Analysis of Paints and Coatings.
 * - Heiple C.R., Roper J.R. (1982) Welding Journal, April; Mills K.C. et al. (1998) Phil. Trans. R. Soc. A 356:911.
 * - Orange peel, silking and picture framing as named in coating practice (common practice).
 *
 * @example expectedDefects({ processKind: 'drying-coat', margin: 0.5, alertThreshold: 1.25, mechanism: 'surface-tension-cells', wavelength: 2e-4, hasLateral: false, surfaceTensionSlope: -1e-4 })[0].name // 'Bénard cells / floating'
 */
export function expectedDefects(input: DefectInput): { name: string; description: string }[] {
  const defects: { name: string; description: string }[] = [];
  const atRisk = input.margin !== null && input.margin < input.alertThreshold;
  const coating = input.processKind === 'drying-coat' || input.processKind === 'cast-film';
  if (input.processKind === 'melt-pool') {
    defects.push(
      input.surfaceTensionSlope < 0
        ? { name: 'Outward surface flow: shallow, wide pool', description: 'dσ/dT < 0 pulls hot liquid from the centre to the rim, so heat spreads sideways (low-sulfur behaviour).' }
        : { name: 'Inward surface flow: deep, narrow pool', description: 'dσ/dT > 0 pulls liquid to the centre and down, so heat digs in (surface-active elements such as sulfur above about 30–70 ppm).' },
    );
  }
  if (atRisk && coating) {
    if (input.mechanism === 'long-wave-thinning') {
      defects.push({ name: 'Dry spots / film rupture', description: 'The free surface thins in long waves until it breaks, well before any cell forms.' });
    } else {
      defects.push({
        name: 'Bénard cells / floating',
        description: 'Surface-tension cells freeze into the film as a hexagonal pattern; pigments separate in the cells and the colour looks blotchy or shifted.',
      });
      defects.push({ name: 'Silking / haze', description: 'Cells drawn out by the moving web or a slope read as fine parallel streaks; very small cells read as haze or loss of gloss.' });
      if (input.wavelength !== null && input.wavelength >= 5e-4) {
        defects.push({ name: 'Orange peel', description: `Cells about ${formatDepth(input.wavelength)} across leave a dimpled, orange-skin texture.` });
      }
    }
  } else if (atRisk && input.processKind !== 'melt-pool') {
    defects.push(
      input.mechanism === 'long-wave-thinning'
        ? { name: 'Dry spots / film rupture', description: 'The free surface thins in long waves until it breaks.' }
        : { name: 'Convection cells', description: 'The layer turns over in cells about one wavelength across; mixing and surface texture follow.' },
    );
  }
  if (input.hasLateral && coating) {
    defects.push({
      name: 'Picture framing / fat edge',
      description: 'Edges dry and cool faster, so surface tension pulls liquid toward them and leaves a thick rim.',
    });
  }
  return defects;
}

interface LeverInput {
  processKind: ProcessKind;
  margin: number | null;
  alertThreshold: number;
  depth: number;
  deltaT: number;
  viscosity: number;
  heatGivenAsFlux: boolean;
  buoyancyShare: number | null;
  longWave: boolean;
  evaluation: PhysicsEvaluation;
}

function fmt(x: number): string {
  return x >= 100 || x < 0.01 ? x.toPrecision(3) : x.toFixed(2);
}

/**
 * Which levers move the margin to the alert threshold, in which direction and how far.
 *
 * ## Method
 * The onset factor λ* scales Ra and Ma together, so at fixed depth the margin is proportional to
 * 1/ΔT: ΔT_target = ΔT·margin/threshold (exactly the solver's largest ΔT ÷ threshold). Ma and Ra
 * are ∝ 1/μ, so the cellular margin ∝ μ: μ_target = μ·threshold/margin (the long-wave mode does not
 * depend on μ: Ma_LW/Ma = (2/3)·Ga(1 + Bi)/Ma is free of μ). With ΔT held, Ma ∝ d and Ra ∝ d³, so
 * the margin ∝ d^−n with n = 1 + 2s (s the buoyancy share); with a heat flux held, ΔT ∝ d and
 * n = 2 + 2s. The long-wave mode: Ma_LW/Ma ∝ d², so the margin ∝ d² and the depth must rise.
 *
 * ## References
 * - Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500 (Ma ∝ ΔT d/μ).
 * - Nield D.A. (1964) J. Fluid Mech. 19:341–352 (Ra ∝ ΔT d³; the drives add).
 * - VanHook S.J. et al. (1997) J. Fluid Mech. 345:45–78 (Ma_LW = (2/3)Ga(1 + Bi)).
 *
 * @returns levers: wet thickness, temperature difference, viscosity
 */
export function marginLevers(input: LeverInput): Lever[] {
  const { margin, alertThreshold: target } = input;
  if (margin === null || !Number.isFinite(margin) || margin <= 0) {
    return [
      {
        lever: 'wet-thickness', direction: 'hold', factor: null, present: input.depth, target: null,
        text: 'No onset is possible at this heating: thickness does not limit this layer.',
      },
    ];
  }
  const quiet = margin >= target;
  const levers: Lever[] = [];

  // Wet thickness
  const s = input.buoyancyShare !== null && Number.isFinite(input.buoyancyShare) ? Math.min(1, Math.max(0, input.buoyancyShare)) : 0;
  let depthFactor: number;
  if (input.longWave) depthFactor = Math.sqrt(target / margin);
  else {
    const n = (input.heatGivenAsFlux ? 2 : 1) + 2 * s;
    depthFactor = (margin / target) ** (1 / n);
  }
  const depthTarget = input.depth * depthFactor;
  const thicknessWord = input.processKind === 'melt-pool' ? 'Pool depth' : 'Wet thickness';
  levers.push({
    lever: 'wet-thickness',
    direction: quiet ? 'hold' : depthFactor < 1 ? 'decrease' : 'increase',
    factor: depthFactor,
    present: input.depth,
    target: depthTarget,
    text: quiet
      ? `${thicknessWord} can go ${depthFactor >= 1 ? 'up' : 'down'} to ${formatDepth(depthTarget)} (×${fmt(depthFactor)}) before the margin falls to ${target}.`
      : `${depthFactor < 1 ? 'Thin' : 'Thicken'} to ${formatDepth(depthTarget)} (×${fmt(depthFactor)}) to reach margin ${target}.`,
  });

  // Temperature difference
  const dT = input.deltaT;
  if (dT !== 0) {
    const dTFactor = margin / target;
    const dTTarget = dT * dTFactor;
    const show = (x: number) => formatQuantity(Math.abs(x), 'temperatureDifference', 'K', 3);
    levers.push({
      lever: 'temperature-difference',
      direction: quiet ? 'hold' : 'decrease',
      factor: dTFactor,
      present: dT,
      target: dTTarget,
      text: quiet
        ? `The temperature difference across the layer can rise to ${show(dTTarget)} (×${fmt(dTFactor)}) before the margin falls to ${target}.`
        : `Cut the temperature difference across the layer from ${show(dT)} to ${show(dTTarget)} (×${fmt(dTFactor)}): a gentler zone, cooler substrate or slower evaporation.`,
    });
  }

  // Viscosity
  if (!input.longWave) {
    const muFactor = target / margin;
    const muTarget = input.viscosity * muFactor;
    const show = (x: number) => formatQuantity(x, 'dynamicViscosity', 'mPa·s', 3);
    levers.push({
      lever: 'viscosity',
      direction: quiet ? 'hold' : 'increase',
      factor: muFactor,
      present: input.viscosity,
      target: muTarget,
      text: quiet
        ? `Viscosity can fall to ${show(muTarget)} (×${fmt(muFactor)}) before the margin falls to ${target}.`
        : `Raise the viscosity from ${show(input.viscosity)} to ${show(muTarget)} (×${fmt(muFactor)}): more solids, a slower tail solvent or a cooler first zone.`,
    });
  } else {
    levers.push({
      lever: 'viscosity', direction: 'hold', factor: null, present: input.viscosity, target: null,
      text: 'Viscosity does not move the long-wave thinning limit; change thickness or temperature difference instead.',
    });
  }
  return levers;
}
