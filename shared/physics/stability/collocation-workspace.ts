/** Scratch arrays of the kernel marginalFactorAt for one collocation size (internal to the solver). */
export interface CollocationWorkspace {
  /** Number of collocation nodes n the arrays are sized for. */
  readonly size: number;
  readonly h: Float64Array;
  readonly s: Float64Array;
  readonly a: Float64Array;
  readonly e: Float64Array;
  readonly hy: Float64Array;
  readonly z: Float64Array;
  readonly kmat: Float64Array;
  readonly re: Float64Array;
  readonly im: Float64Array;
  /** Power-iteration vectors (dominantPositiveEigenvalue). */
  readonly power: Float64Array;
  readonly product: Float64Array;
}

/**
 * Scratch arrays for marginalFactorAt on n nodes, so that repeated evaluations of λ(k) allocate
 * nothing (typed-array allocation dominated the cost of the small solves).
 *
 * ## Method
 * n×n arrays for the thermal and mechanical operators, the right-hand sides (at most n − 3
 * columns: the tangential-stress row and the n − 4 interior rows) and the reduced matrix; length-n
 * vectors for the deflection functional, the eigenvalues and the power iteration. One set per collocation order is shared
 * by every evaluator (see createMarginalFactorEvaluator): the kernel is synchronous and every call
 * overwrites what it uses before reading it.
 *
 * ## References
 * - Boyd, J. P. (2001) *Chebyshev and Fourier Spectral Methods*, 2nd ed., Dover (collocation operators).
 *
 * @param size - number of collocation nodes n [-], integer ≥ 5
 * @returns fresh zeroed arrays
 * @example createCollocationWorkspace(13).a.length // 169
 */
export function createCollocationWorkspace(size: number): CollocationWorkspace {
  const square = () => new Float64Array(size * size);
  return Object.freeze({
    size,
    h: new Float64Array(size),
    s: square(),
    a: square(),
    e: square(),
    hy: new Float64Array(size),
    z: square(),
    kmat: square(),
    re: new Float64Array(size),
    im: new Float64Array(size),
    power: new Float64Array(size),
    product: new Float64Array(size),
  });
}
