/** Sizing answers for a physical layer: evaluation, depth bounds, largest ΔT and the quiet window. */
export { cellWavelength } from './cell-wavelength';
export { evaluateLayer } from './evaluate-layer';
export { DEPTH_TOLERANCE, findDepthCrossing, type DepthCrossingSearch } from './find-depth-crossing';
export { findRootBrent, type RootResult } from './find-root-brent';
export { hexagonSpacing } from './hexagon-spacing';
export { createLayerDepthOnsets, type LayerDepthOnsets } from './layer-depth-onsets';
export { layerGroups } from './layer-groups';
export { layerStabilityProblem } from './layer-stability-problem';
export { maxDeltaT } from './max-delta-t';
export { maxStableDepth } from './max-stable-depth';
export { minStableDepth } from './min-stable-depth';
export { quietWindow } from './quiet-window';
export type {
  DeltaTLimits,
  DepthBound,
  DepthSearchOptions,
  LayerEvaluation,
  LayerGroups,
  PhysicalLayer,
  QuietWindow,
  QuietWindowOptions,
} from './types';
export { validatePhysicalLayer } from './validate-physical-layer';
export { pchipInterpolate } from './pchip-interpolate';
export { sampleDepthOnsets, type DepthOnset } from './sample-depth-onsets';
