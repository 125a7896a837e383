import { criticalMarangoni } from '../stability/critical-marangoni';
import { criticalRayleigh } from '../stability/critical-rayleigh';
import { onsetMargin } from '../stability/onset-margin';
import { regimeLabels } from '../stability/regime-labels';
import { cellWavelength } from './cell-wavelength';
import { hexagonSpacing } from './hexagon-spacing';
import { createLayerDepthOnsets } from './layer-depth-onsets';
import { layerGroups } from './layer-groups';
import { layerStabilityProblem } from './layer-stability-problem';
import { maxDeltaT } from './max-delta-t';
import { maxStableDepth } from './max-stable-depth';
import { minStableDepth } from './min-stable-depth';
import type { DepthSearchOptions, LayerEvaluation, PhysicalLayer } from './types';
import { validatePhysicalLayer } from './validate-physical-layer';

/**
 * Everything QuietLayer reports for one physical layer: groups, onset, cell size and sizing answers.
 *
 * ## Method
 * 1. Groups from the properties ({@link layerGroups}).
 * 2. Onset margin from the linear stability solver, with the deformable surface (Cr, Bo) on a
 *    'surface' top, so `margin` is the most dangerous mode and `cellMargin` the flat cellular one.
 * 3. Pure-buoyancy Ra_c (Ma = 0) and, on a 'surface' top, pure-thermocapillary Ma_c (Ra = 0) for the
 *    same boundaries and Bi.
 * 4. Wavelength 2πd/k_c and hexagon spacing 4πd/(√3 k_c) of the flat cellular mode.
 * 5. maxStableDepth (ΔT held), minStableDepth (deformable surface), and the largest ΔT at this
 *    depth (margin × ΔT; at ΔT = 0 a reference of +1 K, heated from below, is used). The onset and
 *    the two depth searches share their solved depths ({@link createLayerDepthOnsets}): a depth is
 *    solved once, and each new depth starts its wavenumber search at the nearest solved one.
 *
 * ## References
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Nield D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 * - VanHook S. J. et al. (1997) J. Fluid Mech. 345, 45–78. doi:10.1017/S0022112097006101
 *
 * @param layer - physical layer (SI)
 * @param options - depth search range for the sizing answers (default 1e-7–10 m)
 * @returns frozen {@link LayerEvaluation}
 * @throws RangeError naming the first invalid field
 * @example evaluateLayer(layer).margin // e.g. 1.8 → quiet with 80 % headroom
 */
export function evaluateLayer(layer: PhysicalLayer, options: DepthSearchOptions = {}): LayerEvaluation {
  const checked = validatePhysicalLayer(layer);
  const groups = layerGroups(checked);
  // One set of solved depths for the onset and both depth searches: each starts at the layer's own
  // depth and warm-starts from the nearest depth any of them has solved.
  const depthOnsets = createLayerDepthOnsets(checked);
  const onset = depthOnsets.solve(checked.depth, { deformable: true });
  const searchOptions = { ...options, depthOnsets };
  const boundaries = { bottom: checked.bottom, bottomThermal: checked.bottomThermal, top: checked.top, biot: groups.biot };
  const wavenumber = onset.cellWavenumber;
  // The single-drive searches start at the coupled k_c (same boundaries and Bi): fewer λ evaluations.
  const cellHint = Number.isFinite(wavenumber) && wavenumber > 0 ? wavenumber : undefined;
  let limits;
  if (checked.deltaT === 0) {
    const reference = { ...checked, deltaT: 1 };
    limits = maxDeltaT(onsetMargin(layerStabilityProblem(reference, layerGroups(reference), { deformable: true })), 1);
  } else {
    limits = maxDeltaT(onset, checked.deltaT);
  }
  return Object.freeze({
    groups,
    onset,
    criticalRayleigh: criticalRayleigh(boundaries, { wavenumberHint: cellHint }),
    criticalMarangoni: checked.top === 'surface' ? criticalMarangoni(boundaries, { wavenumberHint: cellHint }) : null,
    margin: onset.margin,
    cellMargin: onset.cellMargin,
    regime: onset.regime,
    regimeLabel: regimeLabels[onset.regime],
    longWave: onset.longWave,
    criticalWavenumber: wavenumber,
    wavelength: cellWavelength(checked.depth, wavenumber),
    hexagonSpacing: hexagonSpacing(checked.depth, wavenumber),
    maxStableDepth: maxStableDepth(checked, searchOptions),
    minStableDepth: minStableDepth(checked, searchOptions),
    maxDeltaT: limits,
  });
}
