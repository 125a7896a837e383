/**
 * Least-squares solution of an over-determined linear system A·c ≈ b (rows ≥ columns), used to fit
 * the margin response surface.
 *
 * ## Method
 * Householder QR factorisation of A applied to b, then back substitution on R·c = Qᵀb. Backward
 * stable; it avoids forming AᵀA, whose condition number is the square of A's. Throws when a
 * column is (numerically) dependent on the others: |R_jj| ≤ 1e-12·max|R_ii|.
 *
 * ## References
 * - Golub G. H., Van Loan C. F. (2013) "Matrix Computations", 4th ed., Johns Hopkins Univ. Press,
 *   §5.2 (Householder QR) and §5.3 (full-rank least squares).
 *
 * @param rows - the matrix A, one array per row, all of the same length n ≤ rows.length
 * @param rhs - the right-hand side b, one value per row
 * @returns the coefficients c (length n)
 * @example solveLeastSquares([[1, 0], [1, 1], [1, 2]], [1, 3, 5]) // [1, 2]
 */
export function solveLeastSquares(rows: readonly (readonly number[])[], rhs: readonly number[]): number[] {
  const m = rows.length;
  const n = m > 0 ? rows[0].length : 0;
  if (n === 0 || m < n) throw new RangeError(`rows must hold at least as many rows as columns (got ${m} × ${n})`);
  if (rhs.length !== m) throw new RangeError(`rhs must have one value per row (${m}), got ${rhs.length}`);
  const a = rows.map((row, i) => {
    if (row.length !== n) throw new RangeError(`rows[${i}] has ${row.length} columns, expected ${n}`);
    return Float64Array.from(row);
  });
  const b = Float64Array.from(rhs);
  for (let j = 0; j < n; j += 1) {
    let norm = 0;
    for (let i = j; i < m; i += 1) norm += a[i][j] * a[i][j];
    norm = Math.sqrt(norm);
    if (norm === 0) continue;
    const alpha = a[j][j] > 0 ? -norm : norm;
    const v = new Float64Array(m - j);
    for (let i = j; i < m; i += 1) v[i - j] = a[i][j];
    v[0] -= alpha;
    let vv = 0;
    for (const x of v) vv += x * x;
    if (vv === 0) continue;
    for (let col = j; col < n; col += 1) {
      let dot = 0;
      for (let i = j; i < m; i += 1) dot += v[i - j] * a[i][col];
      const f = (2 * dot) / vv;
      for (let i = j; i < m; i += 1) a[i][col] -= f * v[i - j];
    }
    let dot = 0;
    for (let i = j; i < m; i += 1) dot += v[i - j] * b[i];
    const f = (2 * dot) / vv;
    for (let i = j; i < m; i += 1) b[i] -= f * v[i - j];
  }
  let largest = 0;
  for (let j = 0; j < n; j += 1) largest = Math.max(largest, Math.abs(a[j][j]));
  const c = new Array<number>(n).fill(0);
  for (let j = n - 1; j >= 0; j -= 1) {
    if (!(Math.abs(a[j][j]) > 1e-12 * largest)) {
      throw new RangeError(`column ${j} of the design is dependent on the others; the fit is not determined`);
    }
    let s = b[j];
    for (let col = j + 1; col < n; col += 1) s -= a[j][col] * c[col];
    c[j] = s / a[j][j];
  }
  return c;
}
