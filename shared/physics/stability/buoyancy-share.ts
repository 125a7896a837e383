import { createMarginalFactorEvaluator } from './create-marginal-factor-evaluator';
import { longWaveLimit } from './long-wave-limit';
import type { CheckedProblem } from './validate-problem';

/**
 * Share of buoyancy in the drive of the onset mode, 0..1.
 *
 * ## Method
 * At the onset wavenumber k_c (or in the k → 0 limit for a long-wave onset) take the
 * single-drive neutral values of the same layer: Ra₀ = λ(k_c) with (Ra, Ma) = (1, 0) and
 * Ma₀ = λ(k_c) with (0, 1). With the onset point (λ*Ra, λ*Ma):
 * r = max(0, λ*Ra/Ra₀), m = max(0, λ*Ma/Ma₀) (a stabilising drive contributes 0, an infinite
 * single-drive threshold contributes 0), share = r/(r + m). Nield (1964) found r + m ≈ 1 on the
 * coupled neutral curve, so r and m read as the fractions each drive supplies.
 * If r + m = 0 the share is 1 when λ*Ra > 0 and 0 otherwise.
 *
 * ## References
 * - Nield, D. A. (1964) "Surface tension and buoyancy effects in cellular convection",
 *   J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 *
 * @param problem - checked problem of the onset mode (flat or deformable)
 * @param margin - onset margin λ* [-], finite
 * @param wavenumber - onset wavenumber k_c [1/d]; 0 for the k → 0 limit
 * @returns buoyancy share [-] in 0..1
 * @example buoyancyShare(validateProblem({bottom:'rigid',bottomThermal:'conducting',top:'surface',biot:0,rayleigh:669,marangoni:0}), 1, 2.086) // 1
 */
export function buoyancyShare(problem: CheckedProblem, margin: number, wavenumber: number): number {
  const onsetRayleigh = margin * problem.rayleigh;
  const onsetMarangoni = margin * problem.marangoni;
  const single = (rayleigh: number, marangoni: number): number => {
    const evaluate = createMarginalFactorEvaluator({ ...problem, rayleigh, marangoni });
    return wavenumber > 0 ? evaluate(wavenumber) : longWaveLimit(evaluate, problem.crispation > 0 ? problem.bond : 1);
  };
  // A single positive drive needs no single-drive solve: the rule below gives 1 or 0 whatever Ra₀ or Ma₀ is.
  const thermocapillary = onsetMarangoni > 0 && problem.top === 'surface';
  if (!thermocapillary) return onsetRayleigh > 0 ? 1 : 0;
  if (!(onsetRayleigh > 0)) return 0;
  const r = onsetRayleigh > 0 ? onsetRayleigh / single(1, 0) : 0;
  const m = onsetMarangoni > 0 && problem.top === 'surface' ? onsetMarangoni / single(0, 1) : 0;
  const total = r + m;
  if (!(total > 0) || !Number.isFinite(total)) return onsetRayleigh > 0 ? 1 : 0;
  return Math.min(1, Math.max(0, r / total));
}
