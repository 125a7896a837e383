/** Chebyshev–Gauss–Lobatto collocation on the layer 0 ≤ z ≤ 1 (internal to the solver). */
export interface ChebyshevCollocation {
  /** Number of nodes (order + 1). */
  readonly size: number;
  /** Nodes z_j = (1 + cos(πj/order))/2, so z_0 = 1 (top) and z_last = 0 (bottom). */
  readonly z: Float64Array;
  /** Row-major differentiation matrices d/dz, d²/dz², d³/dz³, d⁴/dz⁴ (size × size). */
  readonly d1: Float64Array;
  readonly d2: Float64Array;
  readonly d3: Float64Array;
  readonly d4: Float64Array;
}

/**
 * Chebyshev collocation nodes and differentiation matrices on 0 ≤ z ≤ 1.
 *
 * ## Method
 * Gauss–Lobatto nodes x_j = cos(πj/N) mapped to z = (1 + x)/2; first-derivative matrix
 * D_ij = (c_i/c_j)(−1)^(i+j)/(x_i − x_j), with the diagonal set to minus the off-diagonal row
 * sum (exact differentiation of constants, which limits round-off), scaled by dx/dz = 2.
 * Higher derivatives are matrix powers. Spectrally accurate for smooth fields.
 *
 * ## References
 * - Boyd, J. P. (2001) *Chebyshev and Fourier Spectral Methods*, 2nd ed., Dover (Chebyshev differentiation matrices).
 * - Baltensperger, R. & Trummer, M. R. (2003) "Spectral differencing with a twist",
 *   SIAM J. Sci. Comput. 24, 1465–1487 (negative-sum diagonal). doi:10.1137/S1064827501388182
 *
 * @param order - polynomial order N [-], integer ≥ 4 (N + 1 nodes)
 * @returns nodes and differentiation matrices (fresh arrays; no shared state)
 * @example chebyshevCollocation(8).z[0] // 1
 */
export function chebyshevCollocation(order: number): ChebyshevCollocation {
  if (!Number.isInteger(order) || order < 4) throw new RangeError(`order must be an integer ≥ 4, got ${order}`);
  const n = order + 1;
  const x = new Float64Array(n);
  const z = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    x[j] = Math.cos((Math.PI * j) / order);
    z[j] = (1 + x[j]) / 2;
  }
  const d1 = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const ci = i === 0 || i === order ? 2 : 1;
    let rowSum = 0;
    for (let j = 0; j < n; j++) {
      if (i === j) continue;
      const cj = j === 0 || j === order ? 2 : 1;
      const sign = (i + j) % 2 === 0 ? 1 : -1;
      const v = (2 * (ci / cj) * sign) / (x[i] - x[j]);
      d1[i * n + j] = v;
      rowSum += v;
    }
    d1[i * n + i] = -rowSum;
  }
  const d2 = multiplySquare(d1, d1, n);
  const d3 = multiplySquare(d2, d1, n);
  const d4 = multiplySquare(d2, d2, n);
  return Object.freeze({ size: n, z, d1, d2, d3, d4 });
}

function multiplySquare(a: Float64Array, b: Float64Array, n: number): Float64Array {
  const c = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const aik = a[i * n + k];
      if (aik === 0) continue;
      for (let j = 0; j < n; j++) c[i * n + j] += aik * b[k * n + j];
    }
  }
  return c;
}
