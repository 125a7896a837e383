/** Options of criticalRayleigh and criticalMarangoni. */
export interface CriticalSearchOptions {
  /**
   * Where the wavenumber search starts [1/d], finite > 0 (for example k_c of the coupled problem at
   * the same boundaries): the minimum is bracketed near it before the coarse scan is tried. With a
   * single drive λ(k) has one cellular minimum, so the hint changes the number of λ evaluations, not
   * the minimum found (see minimiseMarginalFactor).
   */
  readonly wavenumberHint?: number;
}

/**
 * The hint as the search takes it: undefined when absent, else a finite number > 0.
 *
 * @param hint - wavenumber [1/d] or undefined
 * @returns the hint, or undefined
 * @throws RangeError naming wavenumberHint when it is given and not a finite number > 0
 * @example checkedHint(2.5) // 2.5
 */
export function checkedHint(hint: unknown): number | undefined {
  if (hint === undefined) return undefined;
  if (typeof hint !== 'number' || !Number.isFinite(hint) || hint <= 0)
    throw new RangeError(`wavenumberHint must be a finite number > 0 [1/d] when given, got ${String(hint)}`);
  return hint;
}
