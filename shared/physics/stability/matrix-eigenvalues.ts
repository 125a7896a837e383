/** Eigenvalues of a real square matrix, as real and imaginary parts. */
export interface Eigenvalues {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

/**
 * All eigenvalues of a real non-symmetric matrix (no eigenvectors).
 *
 * ## Method
 * 1. Balancing by powers of two (Parlett & Reinsch) to reduce the norm and round-off.
 * 2. Reduction to upper Hessenberg form by stabilised elementary similarity transforms
 *    (Gaussian elimination with pivoting).
 * 3. Francis double-shift QR iteration on the Hessenberg matrix with deflation on negligible
 *    sub-diagonal elements and exceptional shifts after 10 and 20 iterations; a 2×2 block gives
 *    a real pair or a complex-conjugate pair.
 * Cost about 10n³ operations. Eigenvalues are returned in no particular order.
 *
 * ## References
 * - Parlett, B. N. & Reinsch, C. (1969) "Balancing a matrix for calculation of eigenvalues and
 *   eigenvectors", Numer. Math. 13, 293–304. doi:10.1007/BF02165404
 * - Martin, R. S., Peters, G. & Wilkinson, J. H. (1970) "The QR algorithm for real Hessenberg
 *   matrices", Numer. Math. 14, 219–231. doi:10.1007/BF02163331
 * - Golub, G. H. & Van Loan, C. F. (2013) *Matrix Computations*, 4th ed., §7.5.
 *
 * @param matrix - row-major n×n matrix (not modified)
 * @param n - order of the matrix, ≥ 1
 * @returns real and imaginary parts of the n eigenvalues, or null if QR did not converge
 *          within 60 iterations for some eigenvalue (not met in the solver's use; callers treat
 *          null as "no eigenvalue found")
 * @example matrixEigenvalues(new Float64Array([0, 1, -1, 0]), 2) // re [0, 0], im [±1]
 */
export function matrixEigenvalues(matrix: Float64Array, n: number): Eigenvalues | null {
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  return matrixEigenvaluesInPlace(Float64Array.from(matrix), n, re, im) ? { re, im } : null;
}

/**
 * All eigenvalues of a real non-symmetric matrix, overwriting the matrix (no copies).
 *
 * ## Method
 * As matrixEigenvalues (balancing, Hessenberg reduction, Francis double-shift QR) on `a` itself,
 * so a caller that solves many small eigenproblems can reuse its arrays.
 *
 * ## References
 * - Martin, R. S., Peters, G. & Wilkinson, J. H. (1970) Numer. Math. 14, 219–231. doi:10.1007/BF02163331
 *
 * @param a - row-major n×n matrix (overwritten)
 * @param n - order, ≥ 1
 * @param re - receives the real parts (length ≥ n)
 * @param im - receives the imaginary parts (length ≥ n)
 * @returns true, or false if QR did not converge within 60 iterations for some eigenvalue
 * @example matrixEigenvaluesInPlace(new Float64Array([0, 1, -1, 0]), 2, re, im) // re [0, 0], im [±1]
 */
export function matrixEigenvaluesInPlace(a: Float64Array, n: number, re: Float64Array, im: Float64Array): boolean {
  if (n === 1) {
    re[0] = a[0];
    im[0] = 0;
    return true;
  }
  balance(a, n);
  reduceToHessenberg(a, n);
  return hessenbergQr(a, n, re, im);
}

function balance(a: Float64Array, n: number): void {
  const radix = 2;
  const radixSquared = radix * radix;
  let done = false;
  let sweeps = 0;
  while (!done && sweeps < 100) {
    done = true;
    sweeps += 1;
    for (let i = 0; i < n; i++) {
      let r = 0;
      let c = 0;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        c += Math.abs(a[j * n + i]);
        r += Math.abs(a[i * n + j]);
      }
      if (c === 0 || r === 0) continue;
      let g = r / radix;
      let f = 1;
      const s = c + r;
      while (c < g) {
        f *= radix;
        c *= radixSquared;
      }
      g = r * radix;
      while (c > g) {
        f /= radix;
        c /= radixSquared;
      }
      if ((c + r) / f < 0.95 * s) {
        done = false;
        const inv = 1 / f;
        for (let j = 0; j < n; j++) a[i * n + j] *= inv;
        for (let j = 0; j < n; j++) a[j * n + i] *= f;
      }
    }
  }
}

function reduceToHessenberg(a: Float64Array, n: number): void {
  for (let m = 1; m < n - 1; m++) {
    let x = 0;
    let i = m;
    for (let j = m; j < n; j++) {
      if (Math.abs(a[j * n + m - 1]) > Math.abs(x)) {
        x = a[j * n + m - 1];
        i = j;
      }
    }
    if (i !== m) {
      for (let j = m - 1; j < n; j++) {
        const t = a[i * n + j];
        a[i * n + j] = a[m * n + j];
        a[m * n + j] = t;
      }
      for (let j = 0; j < n; j++) {
        const t = a[j * n + i];
        a[j * n + i] = a[j * n + m];
        a[j * n + m] = t;
      }
    }
    if (x !== 0) {
      for (let r = m + 1; r < n; r++) {
        let y = a[r * n + m - 1];
        if (y === 0) continue;
        y /= x;
        for (let j = m; j < n; j++) a[r * n + j] -= y * a[m * n + j];
        for (let j = 0; j < n; j++) a[j * n + m] += y * a[j * n + r];
      }
    }
  }
  // Clear the multipliers below the sub-diagonal: the QR sweep treats the matrix as Hessenberg.
  for (let r = 2; r < n; r++) for (let c = 0; c < r - 1; c++) a[r * n + c] = 0;
}

function hessenbergQr(a: Float64Array, n: number, re: Float64Array, im: Float64Array): boolean {
  const eps = Number.EPSILON;
  const at = (i: number, j: number) => a[i * n + j];
  let anorm = 0;
  for (let i = 0; i < n; i++) for (let j = Math.max(i - 1, 0); j < n; j++) anorm += Math.abs(at(i, j));
  let nn = n - 1;
  let t = 0;
  let p = 0;
  let q = 0;
  let r = 0;
  let s = 0;
  let w = 0;
  let x = 0;
  let y = 0;
  let z = 0;
  while (nn >= 0) {
    let its = 0;
    let l: number;
    do {
      for (l = nn; l > 0; l--) {
        s = Math.abs(at(l - 1, l - 1)) + Math.abs(at(l, l));
        if (s === 0) s = anorm;
        if (Math.abs(at(l, l - 1)) <= eps * s) {
          a[l * n + l - 1] = 0;
          break;
        }
      }
      x = at(nn, nn);
      if (l === nn) {
        re[nn] = x + t;
        im[nn] = 0;
        nn -= 1;
      } else {
        y = at(nn - 1, nn - 1);
        w = at(nn, nn - 1) * at(nn - 1, nn);
        if (l === nn - 1) {
          p = 0.5 * (y - x);
          q = p * p + w;
          z = Math.sqrt(Math.abs(q));
          x += t;
          if (q >= 0) {
            z = p + (p >= 0 ? Math.abs(z) : -Math.abs(z));
            re[nn - 1] = re[nn] = x + z;
            if (z !== 0) re[nn] = x - w / z;
            im[nn - 1] = im[nn] = 0;
          } else {
            re[nn - 1] = re[nn] = x + p;
            im[nn - 1] = z;
            im[nn] = -z;
          }
          nn -= 2;
        } else {
          if (its === 60) return false;
          if (its === 10 || its === 20 || its === 40) {
            t += x;
            for (let i = 0; i <= nn; i++) a[i * n + i] -= x;
            s = Math.abs(at(nn, nn - 1)) + Math.abs(at(nn - 1, nn - 2));
            y = x = 0.75 * s;
            w = -0.4375 * s * s;
          }
          its += 1;
          let m: number;
          for (m = nn - 2; m >= l; m--) {
            z = at(m, m);
            r = x - z;
            s = y - z;
            p = (r * s - w) / at(m + 1, m) + at(m, m + 1);
            q = at(m + 1, m + 1) - z - r - s;
            r = at(m + 2, m + 1);
            s = Math.abs(p) + Math.abs(q) + Math.abs(r);
            p /= s;
            q /= s;
            r /= s;
            if (m === l) break;
            const u = Math.abs(at(m, m - 1)) * (Math.abs(q) + Math.abs(r));
            const v = Math.abs(p) * (Math.abs(at(m - 1, m - 1)) + Math.abs(z) + Math.abs(at(m + 1, m + 1)));
            if (u <= eps * v) break;
          }
          for (let i = m; i < nn - 1; i++) {
            a[(i + 2) * n + i] = 0;
            if (i !== m) a[(i + 2) * n + i - 1] = 0;
          }
          for (let k = m; k < nn; k++) {
            if (k !== m) {
              p = at(k, k - 1);
              q = at(k + 1, k - 1);
              r = 0;
              if (k + 1 !== nn) r = at(k + 2, k - 1);
              x = Math.abs(p) + Math.abs(q) + Math.abs(r);
              if (x !== 0) {
                p /= x;
                q /= x;
                r /= x;
              }
            }
            const norm = Math.sqrt(p * p + q * q + r * r);
            s = p >= 0 ? norm : -norm;
            if (s !== 0) {
              if (k === m) {
                if (l !== m) a[k * n + k - 1] = -at(k, k - 1);
              } else {
                a[k * n + k - 1] = -s * x;
              }
              p += s;
              x = p / s;
              y = q / s;
              z = r / s;
              q /= p;
              r /= p;
              for (let j = k; j <= nn; j++) {
                p = at(k, j) + q * at(k + 1, j);
                if (k + 1 !== nn) {
                  p += r * at(k + 2, j);
                  a[(k + 2) * n + j] -= p * z;
                }
                a[(k + 1) * n + j] -= p * y;
                a[k * n + j] -= p * x;
              }
              const mmin = nn < k + 3 ? nn : k + 3;
              for (let i = l; i <= mmin; i++) {
                p = x * at(i, k) + y * at(i, k + 1);
                if (k + 1 !== nn) {
                  p += z * at(i, k + 2);
                  a[i * n + k + 2] -= p * r;
                }
                a[i * n + k + 1] -= p * q;
                a[i * n + k] -= p;
              }
            }
          }
        }
      }
    } while (l + 1 < nn);
  }
  return true;
}
