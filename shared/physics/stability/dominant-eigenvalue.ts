/** Largest number of power-iteration steps before the caller falls back to the full eigen-solve. */
const MAX_STEPS = 40;
/** Converged when ‖K·v − μ·v‖∞ ≤ RESIDUAL·‖K·v‖∞ (v scaled to ‖v‖∞ = 1). */
const RESIDUAL = 1e-12;
/** Fractional part of the golden ratio, for an irregular start vector. */
const GOLDEN_FRACTION = 0.6180339887498949;

/**
 * The eigenvalue of largest magnitude of a real square matrix, when it is real, positive and well
 * separated; NaN otherwise (the caller then uses the full eigen-solve).
 *
 * ## Method
 * Power iteration from an irregular positive vector (1 + 0.5·frac(0.618·i)), rescaled each step so that its largest component is 1;
 * the estimate μ is the matching component of K·v. It stops when the residual ‖K·v − μ·v‖∞ is
 * below 1e-12 of ‖K·v‖∞, and gives up (NaN) after 40 steps, when μ is not positive, or when the
 * iterate does not settle (a complex or ± pair of dominant eigenvalues, or two of nearly equal
 * size). A positive real eigenvalue of largest magnitude is necessarily the largest positive real
 * eigenvalue, which is what the marginal-factor kernel needs; the error decays as |μ₂/μ₁| per step,
 * about 0.1 for the neutral modes of a layer, so a dozen steps usually suffice against the
 * O(n³) Hessenberg QR of every eigenvalue.
 *
 * ## References
 * - Golub, G. H. & Van Loan, C. F. (2013) *Matrix Computations*, 4th ed., Johns Hopkins
 *   University Press, §7.3.1 (the power method and its convergence ratio |λ₂/λ₁|).
 *
 * @param matrix - row-major m×m matrix K (read only)
 * @param m - order of K
 * @param v - scratch vector of length ≥ m (overwritten)
 * @param w - scratch vector of length ≥ m (overwritten)
 * @returns the dominant eigenvalue μ₁ > 0, or NaN when it is not found as a positive real value
 * @example dominantPositiveEigenvalue(new Float64Array([2, 1, 1, 3]), 2, new Float64Array(2), new Float64Array(2)) // ≈ 3.618
 */
export function dominantPositiveEigenvalue(matrix: Float64Array, m: number, v: Float64Array, w: Float64Array): number {
  // An irregular positive start: a special vector (all ones, say) can be an eigenvector of a smaller
  // eigenvalue and would stop there; this one has a part along every eigenvector of a real problem.
  for (let i = 0; i < m; i++) v[i] = 1 + 0.5 * ((i * GOLDEN_FRACTION) % 1);
  for (let step = 0; step < MAX_STEPS; step++) {
    let largest = 0;
    let at = 0;
    for (let p = 0; p < m; p++) {
      let sum = 0;
      const row = p * m;
      for (let q = 0; q < m; q++) sum += matrix[row + q] * v[q];
      w[p] = sum;
      const size = Math.abs(sum);
      if (size > largest) {
        largest = size;
        at = p;
      }
    }
    if (!(largest > 0) || !Number.isFinite(largest)) return NaN;
    // v has its largest component 1 at the previous step's index; μ is read where w is largest.
    const mu = w[at] / v[at];
    let residual = 0;
    for (let p = 0; p < m; p++) residual = Math.max(residual, Math.abs(w[p] - mu * v[p]));
    const scale = 1 / w[at];
    for (let p = 0; p < m; p++) v[p] = w[p] * scale;
    if (residual <= RESIDUAL * largest) return mu > 0 && Number.isFinite(mu) ? mu : NaN;
  }
  return NaN;
}
