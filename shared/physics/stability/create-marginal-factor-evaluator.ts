import { chebyshevCollocationTable } from './chebyshev-collocation-table';
import { createCollocationWorkspace, type CollocationWorkspace } from './collocation-workspace';
import { marginalFactorAt } from './marginal-factor-at';
import type { CheckedProblem } from './validate-problem';

/** Collocation order by wavenumber band: short waves have thin boundary layers and need more nodes. */
const ORDER_BANDS: readonly (readonly [number, number])[] = [
  [4, 12],
  [6, 14],
  [9, 16],
  [14, 20],
  [22, 28],
  [Infinity, 36],
];

/**
 * Scratch arrays of the kernel, one set per collocation order, shared by every evaluator.
 *
 * Sharing is safe: marginalFactorAt is synchronous and never re-entered, it overwrites every array
 * it reads before reading it (so nothing carries from one call to the next), and each worker thread
 * has its own module instance. Building fresh arrays for every evaluator cost about a tenth of a
 * whole onset solve (an onset builds three or four evaluators); keeping one set removes that.
 */
const SCRATCH = new Map<number, CollocationWorkspace>();

function scratchFor(order: number): CollocationWorkspace {
  let workspace = SCRATCH.get(order);
  if (workspace === undefined) {
    workspace = createCollocationWorkspace(order + 1);
    SCRATCH.set(order, workspace);
  }
  return workspace;
}

/**
 * Build λ(k) for one checked problem. The collocation grids come from the shared read-only table
 * (chebyshevCollocationTable) and the kernel's scratch arrays from the shared set above, so building
 * an evaluator costs nothing and repeated λ(k) allocate nothing.
 *
 * ## Method
 * Chooses the Chebyshev order from the wavenumber (12 nodes + 1 up to k = 4, rising to 36 for
 * k > 22), which keeps λ(k) within about 1e-7 relative of the converged value for the neutral
 * curves of this solver (checked by raising the order), then calls marginalFactorAt.
 *
 * ## References
 * - Boyd, J. P. (2001) *Chebyshev and Fourier Spectral Methods*, 2nd ed., Dover (spectral convergence).
 *
 * @param problem - checked problem (see validateProblem)
 * @returns function of the wavenumber k [1/d] > 0 giving λ(k) [-] (Infinity when no stationary mode)
 * @example createMarginalFactorEvaluator(validateProblem({bottom:'free',bottomThermal:'conducting',top:'free',biot:Infinity,rayleigh:1,marangoni:0}))(Math.PI / Math.SQRT2) // ≈ 657.511
 */
export function createMarginalFactorEvaluator(problem: CheckedProblem): (wavenumber: number) => number {
  return (wavenumber: number): number => {
    let order = ORDER_BANDS[ORDER_BANDS.length - 1][1];
    for (const [limit, bandOrder] of ORDER_BANDS) {
      if (wavenumber <= limit) {
        order = bandOrder;
        break;
      }
    }
    return marginalFactorAt(problem, chebyshevCollocationTable(order), wavenumber, scratchFor(order));
  };
}
