import { solveOnsetMargin } from './solve-onset-margin';
import type { OnsetResult, StabilityProblem } from './types';
import { validateProblem } from './validate-problem';

/** A usable starting wavenumber: finite and > 0 (a long-wave or missing minimum gives none). */
const usable = (k: number): number | undefined => (Number.isFinite(k) && k > 0 ? k : undefined);

/**
 * Onset margins of a sequence of neighbouring problems (for example one layer at many depths),
 * each wavenumber search started where the previous problem's minimum was.
 *
 * ## Method
 * Every problem is checked first (a bad one throws before any solve, naming its index and field).
 * Then each is solved as onsetMargin does, with the flat cellular search bracketed around the
 * previous problem's cellWavenumber and the deformable cellular search around the previous
 * deformable minimum shifted by the change of the flat k_c. When a bracket fails (no previous
 * minimum, a jump in k_c, no stationary mode) that search runs from the full coarse scan, so each
 * result is the onsetMargin result to the solver's tolerance (k_c to about 3e-4, λ to about 1e-7
 * relative); only the number of λ(k) evaluations drops (about half for smooth sweeps). Order
 * matters for speed only: neighbours should be close (as depths on a fine grid).
 *
 * ## References
 * - Press, W. H. et al. (2007) *Numerical Recipes*, 3rd ed., Cambridge, §10.1–10.3 (bracketing
 *   and parabolic refinement of a minimum).
 * - Pearson, J. R. A. (1958) J. Fluid Mech. 4, 489–500; Nield, D. A. (1964) J. Fluid Mech. 19,
 *   341–352; VanHook, S. J. et al. (1997) J. Fluid Mech. 345, 45–78 (the physics, see onsetMargin).
 *
 * @param problems - stability problems in sweep order (see onsetMargin for the fields)
 * @returns one frozen OnsetResult per problem, in the same order
 * @throws RangeError naming the index and the field when a problem is invalid
 * @example onsetMarginSweep(depths.map((d) => problemAt(d))).map((r) => r.margin)
 */
export function onsetMarginSweep(problems: readonly StabilityProblem[]): OnsetResult[] {
  if (!Array.isArray(problems)) throw new RangeError('problems must be an array of stability problems');
  const checked = problems.map((problem, index) => {
    try {
      return validateProblem(problem);
    } catch (error) {
      throw new RangeError(`problems[${index}]: ${(error as Error).message}`);
    }
  });
  const results: OnsetResult[] = [];
  let cellHint: number | undefined;
  let deformableRatio: number | undefined;
  for (let i = 0; i < checked.length; i++) {
    const { result, deformableCellWavenumber } = solveOnsetMargin(checked[i], problems[i], { cell: cellHint, deformableRatio });
    results.push(result);
    cellHint = usable(result.cellWavenumber);
    const deformable = usable(deformableCellWavenumber);
    deformableRatio = cellHint !== undefined && deformable !== undefined ? deformable / cellHint : undefined;
  }
  return results;
}
