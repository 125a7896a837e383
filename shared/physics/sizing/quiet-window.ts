import { requirePositive } from '../groups/require-positive';
import { requireFinite } from '../groups/require-finite';
import { onsetMargin } from '../stability/onset-margin';
import { layerGroups } from './layer-groups';
import { layerStabilityProblem } from './layer-stability-problem';
import { sampleDepthOnsets, type DepthOnset } from './sample-depth-onsets';
import type { PhysicalLayer, QuietWindow, QuietWindowOptions } from './types';
import { validatePhysicalLayer } from './validate-physical-layer';

/**
 * Quiet window of a layer over a depth × ΔT rectangle: onset boundaries and a margin map for plotting.
 *
 * ## Method
 * At each sampled depth the problem is rebuilt from the properties and solved once per heating
 * direction present in the ΔT range, at ΔT = +1 K (and −1 K). Because Ra and Ma are proportional to
 * ΔT while Bi, Cr and Bo do not depend on it, the onset margin along a ray is λ*(d, ΔT) =
 * λ*(d, ±1 K)/|ΔT|, which fills the whole margin grid from one solve per depth and direction; the
 * onset boundary ΔT(d) is λ*(d, ±1 K)·(±1 K) for the flat cellular mode, the long-wave mode and the
 * most dangerous of the two. Depths are spaced logarithmically by default. Not every depth is solved:
 * margins are sampled adaptively and interpolated in log–log coordinates to a relative tolerance
 * (default 10⁻³, {@link sampleDepthOnsets}); `tolerance: 0` solves every depth. Each solve starts its
 * wavenumber search at the critical wavenumber of the nearest depth already solved (a hint only: the
 * solver falls back to a full scan when the bracket fails, so results are unchanged).
 *
 * ## References
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Nield D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 * - VanHook S. J. et al. (1997) J. Fluid Mech. 345, 45–78. doi:10.1017/S0022112097006101
 *
 * @param layer - physical layer (SI); its depth and ΔT are the operating point
 * @param options - depth range [m], ΔT range [K], sample counts (default 200 depths × 60 ΔT), spacing
 * @returns frozen {@link QuietWindow}; margin[iDeltaT][iDepth], null where no onset or ΔT = 0
 * @throws RangeError naming the bad field
 * @example quietWindow(layer, { depthMin: 1e-5, depthMax: 1e-2, deltaTMin: 0, deltaTMax: 30 }).onsetDeltaT[0]
 */
export function quietWindow(layer: PhysicalLayer, options: QuietWindowOptions): QuietWindow {
  const checked = validatePhysicalLayer(layer);
  const depthMin = requirePositive('depthMin', options.depthMin, 'm');
  const depthMax = requirePositive('depthMax', options.depthMax, 'm');
  if (!(depthMax > depthMin)) throw new RangeError(`depthMax must be > depthMin (${depthMin} m), got ${depthMax} m`);
  const deltaTMin = requireFinite('deltaTMin', options.deltaTMin, 'K');
  const deltaTMax = requireFinite('deltaTMax', options.deltaTMax, 'K');
  if (!(deltaTMax > deltaTMin)) throw new RangeError(`deltaTMax must be > deltaTMin (${deltaTMin} K), got ${deltaTMax} K`);
  const depthPoints = countOption('depthPoints', options.depthPoints ?? 200);
  const deltaTPoints = countOption('deltaTPoints', options.deltaTPoints ?? 60);
  const logSpacing = (options.depthSpacing ?? 'log') === 'log';

  const depths = Array.from({ length: depthPoints }, (_, i) => {
    const t = i / (depthPoints - 1);
    return logSpacing ? depthMin * (depthMax / depthMin) ** t : depthMin + (depthMax - depthMin) * t;
  });
  const deltaTs = Array.from({ length: deltaTPoints }, (_, j) => deltaTMin + ((deltaTMax - deltaTMin) * j) / (deltaTPoints - 1));

  const solveAt = (depth: number, deltaT: number, wavenumberHint?: number) => {
    const atPoint = { ...checked, depth, deltaT };
    const problem = layerStabilityProblem(atPoint, layerGroups(atPoint), { deformable: true });
    return onsetMargin(problem, wavenumberHint === undefined ? {} : { wavenumberHint });
  };
  // Start each wavenumber search at the critical wavenumber of the nearest depth already solved.
  const sweep = (deltaT: number) => {
    const known: { logDepth: number; wavenumber: number }[] = [];
    return (depth: number) => {
      const logDepth = Math.log(depth);
      let hint: number | undefined;
      let distance = Infinity;
      for (const k of known) {
        if (Math.abs(k.logDepth - logDepth) < distance) {
          distance = Math.abs(k.logDepth - logDepth);
          hint = k.wavenumber;
        }
      }
      const result = solveAt(depth, deltaT, hint);
      if (Number.isFinite(result.cellWavenumber) && result.cellWavenumber > 0) known.push({ logDepth, wavenumber: result.cellWavenumber });
      return result;
    };
  };
  const tolerance = options.tolerance ?? 1e-3;
  if (!(tolerance >= 0 && tolerance < 0.1)) throw new RangeError(`tolerance must be within 0–0.1, got ${tolerance}`);
  const fromBelow = deltaTMax > 0 ? sampleDepthOnsets(depths, sweep(1), { tolerance }) : [];
  const fromAbove = deltaTMin < 0 ? sampleDepthOnsets(depths, sweep(-1), { tolerance }) : [];
  const curve = (results: DepthOnset[], sign: number, pick: (r: DepthOnset) => number) =>
    results.map((r) => finiteOrNull(pick(r) * sign));

  const margin = deltaTs.map((dT) =>
    depths.map((_, i) => {
      if (dT === 0) return null;
      const r = dT > 0 ? fromBelow[i] : fromAbove[i];
      return finiteOrNull(r.margin / Math.abs(dT));
    }),
  );
  const longWave = deltaTs.map((dT) =>
    depths.map((_, i) => (dT === 0 ? false : (dT > 0 ? fromBelow[i] : fromAbove[i]).longWave)),
  );
  const own = checked.deltaT === 0 ? null : finiteOrNull(solveAt(checked.depth, checked.deltaT).margin);

  return Object.freeze({
    depths,
    deltaTs,
    cellOnsetDeltaT: curve(fromBelow, 1, (r) => r.cellMargin),
    longWaveOnsetDeltaT: curve(fromBelow, 1, (r) => r.longWaveMargin),
    onsetDeltaT: curve(fromBelow, 1, (r) => r.margin),
    cellOnsetDeltaTFromAbove: curve(fromAbove, -1, (r) => r.cellMargin),
    longWaveOnsetDeltaTFromAbove: curve(fromAbove, -1, (r) => r.longWaveMargin),
    onsetDeltaTFromAbove: curve(fromAbove, -1, (r) => r.margin),
    margin,
    longWave,
    operatingPoint: Object.freeze({ depth: checked.depth, deltaT: checked.deltaT, margin: own }),
    solvedDepths: fromBelow.filter((o) => o.solved).length + fromAbove.filter((o) => o.solved).length,
  });
}

function finiteOrNull(value: number): number | null {
  return Number.isFinite(value) ? value : null;
}

function countOption(name: string, value: number): number {
  if (!Number.isInteger(value) || value < 2 || value > 2000) throw new RangeError(`${name} must be an integer 2–2000, got ${value}`);
  return value;
}
