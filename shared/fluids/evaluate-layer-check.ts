import { closedLayerSurfaceSpeed } from '../physics/lateral-flow/closed-layer-surface-speed';
import { openFilmSurfaceSpeed } from '../physics/lateral-flow/open-film-surface-speed';
import { thermocapillaryStress } from '../physics/lateral-flow/thermocapillary-stress';
import { solutalMarangoniNumber } from '../physics/groups/solutal-marangoni-number';
import { evaluateLayer } from '../physics/sizing/evaluate-layer';
import type { DepthBound } from '../physics/sizing/types';
import { criticalMarangoni } from '../physics/stability/critical-marangoni';
import { regimeLabels } from '../physics/stability/regime-labels';
import type { EvaluationWarning, LayerEvaluation, MarginStatus } from '../schemas/layer-checks';
import { STANDARD_GRAVITY } from '../units/constants';
import { formatQuantity } from '../units/format-quantity';
import { expectedDefects, marginLevers } from './defects-and-levers';
import type { FluidLaws } from './fluid-laws';
import { formatDepth, mechanismSentence } from './mechanism-sentence';
import { CLOSING_LINE, processCautions } from './process-cautions';
import { readLayerInput, type LayerFields, type ReadLayer } from './read-layer-input';

export type EvaluateLayerCheckResult = { ok: true; value: LayerEvaluation; read: ReadLayer } | { ok: false; fields: Record<string, string> };

const finite = (x: number): number | null => (Number.isFinite(x) ? x : null);
const boundDepth = (b: DepthBound): number | null => (b.found ? b.depth : null);

/** Teal/amber/crimson word for a margin against the alert threshold. */
export function marginStatus(margin: number | null, alertThreshold: number): MarginStatus {
  if (margin === null) return 'quiet';
  if (margin >= alertThreshold) return 'quiet';
  return margin >= 1 ? 'close' : 'over';
}

/**
 * Evaluate a layer check: read it into SI, run the physics core, and say what the result means
 * in the trade's words (defects, levers, mechanism by depth, cautions and warnings).
 *
 * ## Method
 * 1. {@link readLayerInput}: properties at the evaluation temperature, ΔT from the heating.
 * 2. `evaluateLayer` (physics core): groups, onset margin of the most dangerous mode (deformable
 *    surface on a 'surface' top; the flat cellular margin when `deformableSurface` is false),
 *    critical values, wavelength 2πd/k_c, hexagon spacing 4πd/(√3 k_c), sizing answers.
 * 3. Solutal Marangoni number Ma_c = (−dσ/dc)Δc d/(μD) where the fluid has dσ/dc and D and the
 *    check gives Δc, against the critical Ma of the same solver with an impermeable (no-flux) bottom
 *    and no surface mass transfer — indicative only (Tönsmann et al. 2021 give a drying-film
 *    correlation).
 * 4. Lateral flow: τ = |dσ/dT|ΔT/L; surface speed τd/μ (open layer) and τd/(4μ) (closed layer).
 * 5. Cells across the panel = panel width / wavelength.
 *
 * ## References
 * - Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500. Nield D.A. (1964) J. Fluid Mech. 19:341–352.
 * - Smith M.K., Davis S.H. (1983) J. Fluid Mech. 132:119–144 (lateral-gradient surface speeds).
 * - Tönsmann M., Scharfer P., Schabel W. (2021) Polymers 13(17):2955 (solutal Marangoni in drying films).
 *
 * @param check - the layer fields of a check
 * @param laws - the fluid's laws [SI]
 * @param fluid - whether the fluid is archived
 * @returns the evaluation (contract shape) or field errors keyed by input path
 */
export function evaluateLayerCheck(check: LayerFields, laws: FluidLaws, fluid: { archived: boolean } = { archived: false }): EvaluateLayerCheckResult {
  const read = readLayerInput(check, laws);
  if (!read.ok) return read;
  const r = read.value;
  const { layer, properties } = r;
  let ev;
  try {
    ev = evaluateLayer(layer);
  } catch (error) {
    return { ok: false, fields: { _: (error as Error).message } };
  }
  const deformable = check.top === 'surface' && check.deformableSurface;
  const margin = finite(deformable ? ev.margin : ev.cellMargin);
  const longWave = deformable && ev.longWave;
  const regime = deformable ? ev.regime : margin === null || margin >= 1 ? 'quiet' : ev.onset.mechanism === 'long-wave-thinning' ? 'surface-tension-cells' : ev.regime;
  const mechanism = deformable ? ev.onset.mechanism : ev.onset.mechanism === 'long-wave-thinning' ? 'surface-tension-cells' : ev.onset.mechanism;
  const g = ev.groups;
  const capillaryLength = Math.sqrt(properties.surfaceTension / (properties.density * STANDARD_GRAVITY));
  const wavelength = finite(ev.wavelength);
  const warnings: EvaluationWarning[] = [];

  // Solutal drive
  let solutalMa: number | null = null;
  let solutal: LayerEvaluation['solutal'] = null;
  const hasSolute = properties.soluteSurfaceTensionSlope !== null && properties.soluteDiffusivity !== null;
  if (hasSolute && check.top === 'surface') {
    const dc = check.soluteFractionDifference;
    if (dc === null || dc === undefined) {
      warnings.push({
        code: 'solutal-needs-concentration',
        message: 'This fluid has dσ/dc: give the solvent fraction difference across the layer to see the solutal drive, which usually dominates in drying films.',
      });
    } else {
      solutalMa = solutalMarangoniNumber({
        surfaceTensionConcentrationSlope: properties.soluteSurfaceTensionSlope as number,
        concentrationDifference: dc,
        depth: layer.depth,
        viscosity: properties.viscosity,
        diffusivity: properties.soluteDiffusivity as number,
      });
      const critical = criticalMarangoni({ bottom: layer.bottom, bottomThermal: 'insulating', top: 'surface', biot: 0 }).value;
      const solutalMargin = solutalMa > 0 && Number.isFinite(critical) ? critical / solutalMa : null;
      const dominant = solutalMargin !== null && (margin === null || solutalMargin < margin) ? 'solutal' : 'thermal';
      solutal = { marangoni: solutalMa, critical, margin: solutalMargin, dominant };
      if (dominant === 'solutal') {
        warnings.push({
          code: 'solutal-dominates',
          message: `The solutal drive is nearer onset (solutal margin ${solutalMargin?.toPrecision(3)}) than the thermal one: solvent-content gradients, not temperature, set the cells (indicative).`,
        });
      }
    }
  }

  // Lateral flow
  let lateralFlow: LayerEvaluation['lateralFlow'] = null;
  if (r.lateral && check.top === 'surface') {
    const stress = thermocapillaryStress({
      surfaceTensionSlope: properties.surfaceTensionSlope,
      temperatureDifference: Math.abs(r.lateral.deltaT),
      length: r.lateral.distance,
    });
    const open = openFilmSurfaceSpeed({ stress, depth: layer.depth, viscosity: properties.viscosity });
    const closed = closedLayerSurfaceSpeed({ stress, depth: layer.depth, viscosity: properties.viscosity });
    const direction = properties.surfaceTensionSlope <= 0 ? 'toward-cooler' : 'toward-hotter';
    lateralFlow = {
      surfaceStress: stress,
      openLayerSpeed: open,
      closedLayerSpeed: closed,
      direction,
      text:
        `A ${formatQuantity(Math.abs(r.lateral.deltaT), 'temperatureDifference', 'K', 3)} difference over ${formatDepth(r.lateral.distance)} pulls the surface ` +
        `${direction === 'toward-cooler' ? 'toward the cooler side' : 'toward the hotter side'} at about ${formatQuantity(closed * 1000, 'speed', 'm/s', 3).replace(' m/s', ' mm/s')} ` +
        `(closed layer with return flow) to ${formatQuantity(open * 1000, 'speed', 'm/s', 3).replace(' m/s', ' mm/s')} (liquid free to leave).`,
    };
  }

  // Warnings
  if (deformable && Number.isFinite(ev.onset.longWaveMargin) && (ev.longWave || ev.onset.longWaveMargin < 3 * Math.max(1, ev.cellMargin))) {
    warnings.push({
      code: 'surface-may-deform',
      message: `The free surface may deform: the long-wave thinning margin is ${ev.onset.longWaveMargin.toPrecision(3)}; thin spots can open into dry spots.`,
    });
  }
  if (layer.depth > capillaryLength) {
    warnings.push({
      code: 'thicker-than-capillary-length',
      message: `The layer (${formatDepth(layer.depth)}) is thicker than the capillary length √(σ/(ρg)) = ${formatDepth(capillaryLength)}: gravity, not surface tension, holds the surface flat, and edges and meniscus matter.`,
    });
  }
  const temps = [r.temperature];
  if (laws.validFrom !== null && laws.validTo !== null) {
    for (const t of temps) {
      if (t < laws.validFrom || t > laws.validTo) {
        warnings.push({
          code: 'temperature-outside-range',
          message: `${formatQuantity(t, 'temperature', '°C', 4)} is outside the fluid's stated range ${formatQuantity(laws.validFrom, 'temperature', '°C', 4)} – ${formatQuantity(laws.validTo, 'temperature', '°C', 4)}: the properties are extrapolated.`,
        });
      }
    }
  }
  if (layer.deltaT < 0) {
    warnings.push({ code: 'heated-from-above', message: 'The layer is heated from above (surface warmer than the bottom): for ordinary liquids this is stabilising.' });
  }
  if (fluid.archived) warnings.push({ code: 'fluid-archived', message: 'This fluid is archived: check that its data are still the ones to use.' });

  const hasSurface = check.top === 'surface';
  const status = marginStatus(margin, check.alertThreshold);
  const buoyancyShare = finite(ev.onset.buoyancyShare);
  const value: LayerEvaluation = {
    operatingPoint: {
      depth: layer.depth,
      temperature: r.temperature,
      deltaT: layer.deltaT,
      heatFlux: r.heatFlux,
      heatTransferCoefficient: r.heatTransferCoefficient,
    },
    properties: {
      density: properties.density,
      viscosity: properties.viscosity,
      kinematicViscosity: properties.kinematicViscosity,
      surfaceTension: properties.surfaceTension,
      surfaceTensionSlope: properties.surfaceTensionSlope,
      conductivity: properties.conductivity,
      heatCapacity: properties.heatCapacity,
      thermalDiffusivity: properties.thermalDiffusivity,
      expansion: properties.expansion,
      soluteDiffusivity: properties.soluteDiffusivity,
      soluteSurfaceTensionSlope: properties.soluteSurfaceTensionSlope,
    },
    groups: {
      rayleigh: g.rayleigh,
      marangoni: g.marangoni,
      biot: finite(g.biot),
      prandtl: g.prandtl,
      bond: g.bond,
      dynamicBond: finite(g.dynamicBond),
      crispation: g.crispation,
      galileo: g.galileo,
      solutalMarangoni: solutalMa,
      capillaryLength,
    },
    critical: {
      rayleigh: finite(ev.onset.onsetRayleigh),
      marangoni: finite(ev.onset.onsetMarangoni),
      rayleighAlone: finite(ev.criticalRayleigh.value),
      marangoniAlone: ev.criticalMarangoni ? finite(ev.criticalMarangoni.value) : null,
      wavenumber: longWave ? 0 : finite(ev.criticalWavenumber),
    },
    margin,
    status,
    alertThreshold: check.alertThreshold,
    regime,
    regimeLabel: regimeLabels[regime],
    mechanism,
    mechanismLabel: mechanism === 'none' ? 'None' : regimeLabels[mechanism],
    mechanismSentence: mechanismSentence({
      depth: layer.depth,
      hasSurface,
      longWave,
      dynamicBond: finite(g.dynamicBond),
      rayleighCritical: finite(ev.criticalRayleigh.value),
      marangoniCritical: ev.criticalMarangoni ? finite(ev.criticalMarangoni.value) : null,
    }),
    buoyancyShare,
    cells: {
      wavelength,
      hexagonSpacing: finite(ev.hexagonSpacing),
      acrossPanel: r.panelWidth !== null && wavelength !== null && wavelength > 0 ? r.panelWidth / wavelength : null,
    },
    sizing: {
      maxStableDepth: boundDepth(ev.maxStableDepth),
      minStableDepth: deformable ? boundDepth(ev.minStableDepth) : null,
      maxDeltaT: finite(deformable ? ev.maxDeltaT.mostDangerous : ev.maxDeltaT.cellular),
    },
    solutal,
    lateralFlow,
    defects: expectedDefects({
      processKind: check.processKind,
      margin,
      alertThreshold: check.alertThreshold,
      mechanism,
      wavelength,
      hasLateral: lateralFlow !== null,
      surfaceTensionSlope: properties.surfaceTensionSlope,
    }),
    levers: marginLevers({
      processKind: check.processKind,
      margin,
      alertThreshold: check.alertThreshold,
      depth: layer.depth,
      deltaT: layer.deltaT,
      viscosity: properties.viscosity,
      heatGivenAsFlux: check.heating.mode === 'heat-flux' || check.heating.mode === 'evaporation',
      buoyancyShare,
      longWave,
      evaluation: ev,
    }),
    cautions: processCautions(check.processKind),
    closingLine: CLOSING_LINE,
    warnings,
  };
  return { ok: true, value, read: r };
}
