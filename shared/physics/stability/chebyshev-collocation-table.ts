import { chebyshevCollocation, type ChebyshevCollocation } from './chebyshev-collocation';

/**
 * Chebyshev collocation grids by order, built once and then shared (read-only).
 *
 * This is the solver's only module-level table. It is pure in effect: the grid of an order is a
 * fixed mathematical object (nodes and differentiation matrices depend on the order alone), it
 * is built lazily on first use by the same deterministic function whatever the caller, the grid
 * object is frozen (its arrays cannot be swapped) and its typed arrays, which JavaScript cannot
 * freeze, are never written by the solver (the kernel only reads z and d1…d4; the table is not
 * exported from the package), and no caller can observe whether a grid came from the table or was
 * freshly built. At most one grid per order of the band table is kept (six). It only saves
 * rebuilding the same matrices (≈ 3·n³ operations) for every evaluator.
 */
const GRIDS = new Map<number, ChebyshevCollocation>();

/**
 * The collocation grid of one order, from the lazily built table.
 *
 * ## Method
 * Looks the order up; on a miss builds it with chebyshevCollocation and keeps it.
 *
 * ## References
 * - Boyd, J. P. (2001) *Chebyshev and Fourier Spectral Methods*, 2nd ed., Dover.
 *
 * @param order - polynomial order N [-], integer ≥ 4
 * @returns the shared grid (treat as read-only)
 * @example chebyshevCollocationTable(12).size // 13
 */
export function chebyshevCollocationTable(order: number): ChebyshevCollocation {
  let grid = GRIDS.get(order);
  if (grid === undefined) {
    grid = chebyshevCollocation(order);
    GRIDS.set(order, grid);
  }
  return grid;
}
