import { solveLinearSystemsInPlace } from './solve-linear-systems-in-place';

/**
 * Solve A·X = B for several right-hand sides by LU factorisation with partial pivoting.
 *
 * ## Method
 * Doolittle elimination with row pivoting on a copy of A, then forward and back substitution
 * for each column of B (solveLinearSystemsInPlace on copies). O(n³/3 + n²m) operations.
 *
 * ## References
 * - Golub, G. H. & Van Loan, C. F. (2013) *Matrix Computations*, 4th ed., Johns Hopkins
 *   University Press, §3.4 (Gaussian elimination with partial pivoting).
 *
 * @param a - row-major n×n matrix (not modified)
 * @param n - order of A
 * @param b - row-major n×m right-hand sides (not modified)
 * @param m - number of right-hand sides
 * @returns row-major n×m solution, or null when A is numerically singular (a zero pivot)
 * @example solveLinearSystems(new Float64Array([2, 0, 0, 4]), 2, new Float64Array([2, 4]), 1) // [1, 1]
 */
export function solveLinearSystems(a: Float64Array, n: number, b: Float64Array, m: number): Float64Array | null {
  const x = Float64Array.from(b);
  return solveLinearSystemsInPlace(Float64Array.from(a), n, x, m) ? x : null;
}
