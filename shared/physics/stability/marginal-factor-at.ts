import type { ChebyshevCollocation } from './chebyshev-collocation';
import { createCollocationWorkspace, type CollocationWorkspace } from './collocation-workspace';
import { dominantPositiveEigenvalue } from './dominant-eigenvalue';
import { matrixEigenvaluesInPlace } from './matrix-eigenvalues';
import { solveLinearSystemsInPlace } from './solve-linear-systems-in-place';
import type { CheckedProblem } from './validate-problem';

/** Relative size of an imaginary part below which an eigenvalue counts as real (round-off splits double roots). */
const REAL_TOLERANCE = 1e-6;
/** Relative size below which the weaker drive is dropped. */
const NEGLIGIBLE_DRIVE = 1e-13;

/**
 * Marginal factor λ(k) of a checked problem on a given collocation grid (the solver's kernel).
 *
 * ## Method
 * Scales: length d, velocity κ/d, pressure μκ/d², temperature ΔT. Conduction state T̄ = −z
 * (relative to the bottom), surface at z = 1. Normal modes w = W(z)e^{ikx}, θ = Θ(z)e^{ikx},
 * surface deflection ζ = H e^{ikx}. Boussinesq, steady (growth rate 0, so the Prandtl number
 * drops out), after eliminating pressure and horizontal velocity:
 *
 *     (D² − k²)² W = λRa k² Θ,        (D² − k²) Θ = −W,        0 < z < 1.
 *
 * Bottom (z = 0): W = 0 and DW = 0 (rigid) or D²W = 0 (free); Θ = 0 (conducting) or DΘ = 0
 * (insulating). Top 'rigid': W = DW = 0; top 'free': W = D²W = 0; both with DΘ + Bi Θ = 0
 * (Θ = 0 when Bi = ∞).
 *
 * Top 'surface' at z = 1 + ζ, derived from the linearised stress and heat balances:
 * - kinematic ∂ζ/∂t = w ⇒ W(1) = 0 for a stationary mode;
 * - heat: surface temperature perturbation is Θ(1) + (dT̄/dz)H = Θ(1) − H, so the Newton
 *   cooling condition becomes DΘ + Bi(Θ − H) = 0 (Θ = H when Bi = ∞);
 * - tangential stress μ(∂u/∂z + ∂w/∂x) = ∂σ/∂x = −σ_T ∂T_s/∂x, with U = iDW/k from
 *   continuity and W(1) = 0: D²W = −λMa k²(Θ − H);
 * - normal stress −p + 2μ ∂w/∂z − (hydrostatic −ρgζ) = σ ∂²ζ/∂x², with the pressure from the
 *   horizontal momentum balance P = (D² − k²)DW/k²: D³W − 3k²DW = k²(Ga + k²/Cr)H, i.e.
 *   H = Cr (D³W − 3k²DW)(1) / (k²(Bo + k²)), Ga = Bo/Cr. Cr → 0 gives H → 0: Pearson's flat
 *   surface. For k → 0 with a rigid conducting bottom this yields (derived here by a regular
 *   expansion W = k²w, Θ = Bi z/(1+Bi) H + O(k²)) the long-wave threshold
 *   λ_LW = (2/3)Ga(1 + Bi) / (Ma + (11/60)·Bi·Ra), which for Ra = 0 is VanHook et al.'s
 *   Ma_LW = (2/3)Ga(1 + Bi); for a free (slip) bottom λ_LW = Ga(1 + Bi)/(Ma + Bi·Ra/3).
 *
 * Discretisation: Chebyshev collocation for W and Θ on the same nodes, boundary conditions by
 * row replacement. H is a linear functional of W, so Θ = T·W with T = S⁻¹R from the thermal
 * rows (no λ there). The system is A·W = λ·B·W, linear in λ because both Ra and Ma scale with
 * ΔT; only the interior rows (buoyancy) and the tangential-stress row (thermocapillarity) of B
 * are non-zero, so the non-zero eigenvalues μ = 1/λ of A⁻¹B are those of the small matrix
 * K = B_I·A⁻¹·E_I (I = non-zero rows). K is 1×1 for pure thermocapillarity. The answer is
 * 1/μ for the largest positive real μ, i.e. the smallest positive λ: a stationary neutral mode.
 * Complex μ (oscillatory onset) are not stationary and are skipped. Power iteration
 * (dominantPositiveEigenvalue) finds μ when it is also the eigenvalue of largest magnitude, the
 * usual case; otherwise every eigenvalue of K comes from Hessenberg QR and the largest positive real
 * one is taken (the two agreed to 2e-11 relative on 20,000 random problems of every boundary set).
 *
 * ## References
 * - Pearson, J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Nield, D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 * - Takashima, M. (1981) "Surface tension driven instability in a horizontal liquid layer with a
 *   deformable free surface. I. Stationary convection", J. Phys. Soc. Japan 50, 2745–2750.
 *   doi:10.1143/JPSJ.50.2745
 * - Davis, S. H. (1987) "Thermocapillary instabilities", Annu. Rev. Fluid Mech. 19, 403–435.
 *   doi:10.1146/annurev.fl.19.010187.002155
 * - VanHook, S. J. et al. (1997) J. Fluid Mech. 345, 45–78. doi:10.1017/S0022112097006101
 * - Boyd, J. P. (2001) *Chebyshev and Fourier Spectral Methods*, 2nd ed., Dover (collocation, row replacement).
 * - Golub, G. H. & Van Loan, C. F. (2013) *Matrix Computations*, 4th ed., §7.3.1 (power method), §7.5 (QR).
 *
 * @param problem - checked problem (see validateProblem)
 * @param grid - collocation grid (see chebyshevCollocation)
 * @param wavenumber - k [1/d], finite > 0
 * @param workspace - scratch arrays for grid.size nodes (optional; a fresh one is made when absent)
 * @returns λ(k) [-] > 0, or Infinity when no stationary neutral mode exists along the ray
 * @example marginalFactorAt(validateProblem({bottom:'rigid',bottomThermal:'conducting',top:'rigid',biot:Infinity,rayleigh:1000,marangoni:0}), chebyshevCollocation(20), 3.117) // ≈ 1.7078
 */
export function marginalFactorAt(
  problem: CheckedProblem,
  grid: ChebyshevCollocation,
  wavenumber: number,
  workspace: CollocationWorkspace = createCollocationWorkspace(grid.size),
): number {
  const { size: n, d1, d2, d3, d4 } = grid;
  const k2 = wavenumber * wavenumber;
  const k4 = k2 * k2;
  const last = n - 1;
  const surface = problem.top === 'surface';
  // Only the direction of (Ra, Ma) matters for the eigenvectors: solve with the drives divided by
  // their larger magnitude (keeps tiny or huge drives away from under- and overflow), then rescale.
  const driveScale = Math.max(Math.abs(problem.rayleigh), surface ? Math.abs(problem.marangoni) : 0);
  if (!(driveScale > 0)) return Infinity;
  // A drive 1e-13 times smaller than the other changes λ by less than round-off: drop it, which
  // also keeps sub-normal numbers (very slow arithmetic) out of the eigen-solve.
  const rayleigh = Math.abs(problem.rayleigh) >= NEGLIGIBLE_DRIVE * driveScale ? problem.rayleigh / driveScale : 0;
  const marangoni = Math.abs(problem.marangoni) >= NEGLIGIBLE_DRIVE * driveScale ? problem.marangoni / driveScale : 0;
  // A conducting surface (Bi = ∞) holds Θ(1) = H exactly: no surface-temperature perturbation and
  // no thermocapillary stress, so the Marangoni row is dropped rather than left as round-off.
  const hasMarangoni = surface && marangoni !== 0 && problem.biot !== Infinity;
  const hasBuoyancy = rayleigh !== 0;
  if (!hasMarangoni && !hasBuoyancy) return Infinity;

  // Surface deflection H = h·W (row vector); zero for a flat surface.
  const deformable = surface && problem.crispation > 0;
  const { h, s, a, e, hy, z, kmat, re, im } = workspace;
  h.fill(0);
  if (deformable) {
    const scale = problem.crispation / (k2 * (problem.bond + k2));
    for (let j = 0; j < n; j++) h[j] = scale * (d3[j] - 3 * k2 * d1[j]);
  }

  // Thermal operator S·Θ = R·W (interior (D² − k²)Θ = −W; top Biot row with Bi·H; bottom row).
  s.fill(0);
  for (let i = 1; i < last; i++) {
    for (let j = 0; j < n; j++) s[i * n + j] = d2[i * n + j];
    s[i * n + i] -= k2;
  }
  const conductingTop = problem.biot === Infinity;
  if (conductingTop) s[0] = 1;
  else {
    for (let j = 0; j < n; j++) s[j] = d1[j];
    s[0] += problem.biot;
  }
  if (problem.insulatingBottom) for (let j = 0; j < n; j++) s[last * n + j] = d1[last * n + j];
  else s[last * n + last] = 1;

  // Mechanical operator A (row replacement for the four boundary conditions).
  a.fill(0);
  for (let i = 2; i < last - 1; i++) {
    for (let j = 0; j < n; j++) a[i * n + j] = d4[i * n + j] - 2 * k2 * d2[i * n + j];
    a[i * n + i] += k4;
  }
  a[0] = 1; // W(1) = 0
  const topSecond = problem.top === 'rigid' ? d1 : d2; // DW(1) = 0 or D²W(1) = (Marangoni term)
  for (let j = 0; j < n; j++) a[n + j] = topSecond[j];
  const bottomSecond = problem.rigidBottom ? d1 : d2;
  for (let j = 0; j < n; j++) a[(last - 1) * n + j] = bottomSecond[last * n + j];
  a[last * n + last] = 1; // W(0) = 0

  // Non-zero rows I of B. K = B_I·A⁻¹·E_I is built as Y = A⁻¹E_I, Z = R·Y, Θ-part = S⁻¹Z.
  const rows: number[] = [];
  if (hasMarangoni) rows.push(1);
  if (hasBuoyancy) for (let i = 2; i < last - 1; i++) rows.push(i);
  const m = rows.length;
  e.fill(0, 0, n * m);
  for (let q = 0; q < m; q++) e[rows[q] * m + q] = 1;
  if (!solveLinearSystemsInPlace(a, n, e, m)) return Infinity;
  const y = e;
  hy.fill(0, 0, m); // H of each column of Y
  if (deformable) for (let j = 0; j < n; j++) for (let q = 0; q < m; q++) hy[q] += h[j] * y[j * m + q];
  z.fill(0, 0, n * m);
  for (let i = 1; i < last; i++) for (let q = 0; q < m; q++) z[i * m + q] = -y[i * m + q];
  for (let q = 0; q < m; q++) z[q] = conductingTop ? hy[q] : problem.biot * hy[q];
  if (!solveLinearSystemsInPlace(s, n, z, m)) return Infinity;
  const theta = z;
  for (let p = 0; p < m; p++) {
    const i = rows[p];
    if (i === 1) {
      const f = -marangoni * k2;
      for (let q = 0; q < m; q++) kmat[p * m + q] = f * (theta[q] - hy[q]);
    } else {
      const f = rayleigh * k2;
      for (let q = 0; q < m; q++) kmat[p * m + q] = f * theta[i * m + q];
    }
  }
  let best = 0;
  if (m === 1) best = Math.max(0, kmat[0]); // pure thermocapillarity: K is 1×1, its entry is μ
  else {
    // Usually the dominant eigenvalue is the positive real one wanted: a few matrix-vector products.
    const dominant = dominantPositiveEigenvalue(kmat, m, workspace.power, workspace.product);
    if (dominant > 0) return finiteOrInfinity(1 / dominant / driveScale);
    if (!matrixEigenvaluesInPlace(kmat, m, re, im)) return Infinity;
    for (let i = 0; i < m; i++) {
      const mu = re[i];
      if (mu > best && Math.abs(im[i]) <= REAL_TOLERANCE * mu) best = mu;
    }
  }
  return finiteOrInfinity(1 / best / driveScale);
}

function finiteOrInfinity(lambda: number): number {
  return Number.isFinite(lambda) && lambda > 0 ? lambda : Infinity;
}
