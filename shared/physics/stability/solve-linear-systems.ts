/**
 * Solve A·X = B for several right-hand sides by LU factorisation with partial pivoting.
 *
 * ## Method
 * Doolittle elimination with row pivoting on a copy of A, then forward and back substitution
 * for each column of B. O(n³/3 + n²m) operations.
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
  const lu = Float64Array.from(a);
  const x = Float64Array.from(b);
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
    if (!(pivotAbs > 0) || !Number.isFinite(pivotAbs)) return null;
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
  for (let row = n - 1; row >= 0; row--) {
    const pivot = lu[row * n + row];
    for (let c = 0; c < m; c++) {
      let s = x[row * m + c];
      for (let k = row + 1; k < n; k++) s -= lu[row * n + k] * x[k * m + c];
      x[row * m + c] = s / pivot;
    }
  }
  return x;
}

function swapRows(a: Float64Array, width: number, i: number, j: number): void {
  for (let c = 0; c < width; c++) {
    const t = a[i * width + c];
    a[i * width + c] = a[j * width + c];
    a[j * width + c] = t;
  }
}
