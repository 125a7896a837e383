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
 * Build λ(k) for one checked problem. The collocation grids come from the shared read-only table
 * (chebyshevCollocationTable), so building an evaluator costs nothing; the scratch arrays of the
 * kernel are kept in the returned closure per order (nothing is kept between calls of this function).
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
  // Scratch arrays per collocation order, owned by this closure (so repeated λ(k) allocate nothing).
  const workspaces = new Map<number, CollocationWorkspace>();
  return (wavenumber: number): number => {
    let order = ORDER_BANDS[ORDER_BANDS.length - 1][1];
    for (const [limit, bandOrder] of ORDER_BANDS) {
      if (wavenumber <= limit) {
        order = bandOrder;
        break;
      }
    }
    let workspace = workspaces.get(order);
    if (workspace === undefined) {
      workspace = createCollocationWorkspace(order + 1);
      workspaces.set(order, workspace);
    }
    return marginalFactorAt(problem, chebyshevCollocationTable(order), wavenumber, workspace);
  };
}
