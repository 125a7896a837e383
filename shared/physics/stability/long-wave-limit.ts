/**
 * λ(k) as k → 0, from two evaluations at small wavenumbers.
 *
 * ## Method
 * A finite long-wave limit behaves as λ(k) = λ₀ + c·k² + O(k⁴) (the problem depends on k
 * through k² only), so Richardson extrapolation λ₀ ≈ (4λ(k₁) − λ(2k₁))/3 removes the k² term.
 * On a deformable surface the relevant small scale is k² ≪ Bo (gravity against surface tension),
 * so k₁ = 10⁻³·min(1, √Bo), but not below 10⁻⁴ (smaller k loses digits to the near-singular
 * heat operator of an insulating layer; the Richardson step removes the k²/Bo term exactly).
 * A limit that diverges (λ(k₁) > 1.5·λ(2k₁),
 * as for λ ∝ 1/k² when a boundary holds the temperature) is reported as Infinity. A limit
 * that tends to 0 (no gravity) is reported as 0.
 *
 * ## References
 * - Richardson, L. F. (1911) Phil. Trans. R. Soc. A 210, 307–357 (extrapolation to the limit).
 *   doi:10.1098/rsta.1911.0009
 * - Davis, S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435 (long-wave expansions in k²).
 *
 * @param evaluate - λ(k) [-] for k [1/d] > 0
 * @param bond - Bond number Bo [-] ≥ 0 (use 1 for a flat surface)
 * @returns λ₀ [-] ≥ 0, or Infinity when the limit is infinite
 * @example longWaveLimit((k) => 48 + 3 * k * k, 1) // ≈ 48
 */
export function longWaveLimit(evaluate: (wavenumber: number) => number, bond: number): number {
  const k1 = Math.max(1e-4, 1e-3 * Math.min(1, Math.sqrt(bond)));
  const near = evaluate(k1);
  const far = evaluate(2 * k1);
  if (!Number.isFinite(near) || !Number.isFinite(far)) return Infinity;
  if (near > 1.5 * far) return Infinity;
  const limit = (4 * near - far) / 3;
  return limit > 0 ? limit : 0;
}
