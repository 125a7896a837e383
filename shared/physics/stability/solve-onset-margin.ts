import { buoyancyShare } from './buoyancy-share';
import { classifyRegime } from './classify-regime';
import { createMarginalFactorEvaluator } from './create-marginal-factor-evaluator';
import { criticalFactor } from './critical-factor';
import { flatCellularMinimum } from './cellular-margin';
import { longWaveLimit } from './long-wave-limit';
import type { OnsetResult, StabilityProblem } from './types';
import type { CheckedProblem } from './validate-problem';

/** Where the wavenumber searches start (both optional; see minimiseMarginalFactor). */
export interface OnsetSearchHints {
  /** Expected k_c of the flat cellular mode [1/d]. */
  readonly cell?: number;
  /**
   * Expected ratio of the deformable to the flat cellular k_c [-] (the ratio found for a
   * neighbouring problem); the deformable search starts at the flat k_c times this (default 1).
   */
  readonly deformableRatio?: number;
}

/** An onset result with the deformable cellular wavenumber that a sweep carries to its next problem. */
export interface OnsetSolution {
  readonly result: OnsetResult;
  /** k of the deformable cellular minimum [1/d] (also when the long-wave mode wins); NaN if none or flat. */
  readonly deformableCellWavenumber: number;
}

/**
 * Onset margin of a checked problem, with optional starting wavenumbers (the work of onsetMargin
 * and onsetMarginSweep after validation).
 *
 * ## Method
 * 1. Flat cellular problem: flatCellularMinimum (bracket around hints.cell, else the coarse scan).
 * 2. Deformable surface: long-wave limit (longWaveLimit) and the deformable cellular minimum
 *    (bracket around the flat k_c times hints.deformableRatio); the lower of the two is the mode.
 * 3. buoyancyShare and classifyRegime at the onset mode. Full description in onsetMargin.
 *
 * ## References
 * - Pearson, J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Nield, D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 * - VanHook, S. J. et al. (1997) J. Fluid Mech. 345, 45–78. doi:10.1017/S0022112097006101
 *
 * @param checked - checked problem (see validateProblem)
 * @param drives - the caller's Ra and Ma [-] as given (for onsetRayleigh, onsetMarangoni)
 * @param hints - expected flat k_c [1/d] and deformable/flat k_c ratio [-], finite > 0, or undefined
 * @returns the frozen OnsetResult and the deformable cellular wavenumber [1/d]
 * @example solveOnsetMargin(validateProblem(p), p, {}).result.margin // as onsetMargin(p).margin
 */
export function solveOnsetMargin(
  checked: CheckedProblem,
  drives: Pick<StabilityProblem, 'rayleigh' | 'marangoni'>,
  hints: OnsetSearchHints,
): OnsetSolution {
  const flat = checked.crispation > 0 ? { ...checked, crispation: 0 } : checked;
  const cell = flatCellularMinimum(checked, hints.cell);

  let margin = cell.factor;
  let wavenumber = cell.wavenumber;
  let longWave = false;
  let longWaveMargin = Infinity;
  let modeProblem = flat;
  let deformableCellWavenumber = NaN;
  if (checked.crispation > 0) {
    const evaluate = createMarginalFactorEvaluator(checked);
    longWaveMargin = longWaveLimit(evaluate, checked.bond);
    // The cellular minimum of the deformable problem lies near the flat one: bracket it there
    // (widening downhill, and the full scan if that fails).
    // (With opposite drives, where a bracket is not used, the coarse scan is centred there instead.)
    const flatMinimum = cell.wavenumber > 0 && Number.isFinite(cell.factor) ? cell.wavenumber : undefined;
    const near = flatMinimum === undefined ? undefined : flatMinimum * (hints.deformableRatio ?? 1);
    const scan = flatMinimum === undefined ? undefined : [flatMinimum / 1.25, flatMinimum, flatMinimum * 1.25];
    const deformable = criticalFactor(checked, evaluate, { limitAtZero: longWaveMargin, wavenumberHint: near, scan });
    deformableCellWavenumber = Number.isFinite(deformable.factor) ? deformable.wavenumber : NaN;
    modeProblem = checked;
    if (longWaveMargin <= deformable.factor && Number.isFinite(longWaveMargin)) {
      margin = longWaveMargin;
      wavenumber = 0;
      longWave = true;
    } else {
      margin = deformable.factor;
      wavenumber = deformable.wavenumber;
    }
    // A deformable surface never makes the layer more stable than the flat one, so the most
    // dangerous margin is never above cellMargin. Where the separate solves disagree in the last
    // digits (seen only at margins near the top of double precision), keep the flat cellular answer.
    if (margin > cell.factor) {
      margin = cell.factor;
      wavenumber = cell.wavenumber;
      longWave = false;
      modeProblem = flat;
    }

  }

  const finite = Number.isFinite(margin);
  const share = finite ? buoyancyShare(modeProblem, margin, wavenumber) : NaN;
  const regime = finite ? classifyRegime({ margin, buoyancyShare: share, longWave }) : 'quiet';
  const mechanism = finite ? classifyRegime({ margin: 0, buoyancyShare: share, longWave }) : 'none';
  const result: OnsetResult = Object.freeze({
    margin,
    criticalWavenumber: finite ? wavenumber : NaN,
    longWave,
    cellMargin: cell.factor,
    cellWavenumber: Number.isFinite(cell.factor) ? cell.wavenumber : NaN,
    longWaveMargin,
    onsetRayleigh: scaleDrive(margin, drives.rayleigh),
    onsetMarangoni: scaleDrive(margin, drives.marangoni),
    buoyancyShare: share,
    regime,
    mechanism: mechanism === 'quiet' ? 'none' : mechanism,
  });
  return Object.freeze({ result, deformableCellWavenumber });
}

function scaleDrive(factor: number, drive: number): number {
  return drive === 0 ? 0 : factor * drive;
}
