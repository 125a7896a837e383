/**
 * Solve A·X = B for several right-hand sides in place, by LU factorisation with partial pivoting.
 *
 * ## Method
 * As solveLinearSystems, without copies: `lu` is overwritten by the factors and `x` (holding B
 * on entry) by the solution. Lets a caller that solves many small systems reuse its arrays.
 *
 * ## References
 * - Golub, G. H. & Van Loan, C. F. (2013) *Matrix Computations*, 4th ed., Johns Hopkins
 *   University Press, §3.4 (Gaussian elimination with partial pivoting).
 *
 * @param lu - row-major n×n matrix A (overwritten)
 * @param n - order of A
 * @param x - row-major n×m right-hand sides on entry, the solution on return
 * @param m - number of right-hand sides
 * @returns true, or false when A is numerically singular (a zero pivot; x is then meaningless)
 * @example const x = new Float64Array([2, 4]); solveLinearSystemsInPlace(new Float64Array([2, 0, 0, 4]), 2, x, 1); // x = [1, 1]
 */
export function solveLinearSystemsInPlace(lu: Float64Array, n: number, x: Float64Array, m: number): boolean {
  for (let col = 0; col < n; col++) {
    let pivotRow = col;
    let pivotAbs = Math.abs(lu[col * n + col]);
    for (let r = col + 1; r < n; r++) {
      const v = Math.abs(lu[r * n + col]);
      if (v > pivotAbs) {
        pivotAbs = v;
        pivotRow = r;
      }
    }
    if (!(pivotAbs > 0) || !Number.isFinite(pivotAbs)) return false;
    if (pivotRow !== col) {
      swapRows(lu, n, col, pivotRow);
      swapRows(x, m, col, pivotRow);
    }
    const pivot = lu[col * n + col];
    for (let r = col + 1; r < n; r++) {
      const factor = lu[r * n + col] / pivot;
      if (factor === 0) continue;
      lu[r * n + col] = 0;
      for (let c = col + 1; c < n; c++) lu[r * n + c] -= factor * lu[col * n + c];
      for (let c = 0; c < m; c++) x[r * m + c] -= factor * x[col * m + c];
    }
  }
  // Back substitution row by row, updating all right-hand sides together (contiguous rows of x).
  for (let row = n - 1; row >= 0; row--) {
    const rowStart = row * m;
    for (let k = row + 1; k < n; k++) {
      const f = lu[row * n + k];
      if (f === 0) continue;
      const kStart = k * m;
      for (let c = 0; c < m; c++) x[rowStart + c] -= f * x[kStart + c];
    }
    const inverse = 1 / lu[row * n + row];
    for (let c = 0; c < m; c++) x[rowStart + c] *= inverse;
  }
  return true;
}

function swapRows(a: Float64Array, width: number, i: number, j: number): void {
  for (let c = 0; c < width; c++) {
    const t = a[i * width + c];
    a[i * width + c] = a[j * width + c];
    a[j * width + c] = t;
  }
}
