import { createMarginalFactorEvaluator } from './create-marginal-factor-evaluator';
import type { NeutralCurve, NeutralCurveOptions, StabilityProblem } from './types';
import { validateProblem } from './validate-problem';

/**
 * Stationary neutral curve along the ray (λ·Ra, λ·Ma) sampled at evenly spaced wavenumbers.
 *
 * ## Method
 * λ(k) from marginalFactor at each wavenumber (one collocation grid per order, built once per
 * call); Rayleigh and Marangoni numbers on the curve are λ(k)·Ra and λ(k)·Ma.
 *
 * ## References
 * - Chandrasekhar, S. (1961) *Hydrodynamic and Hydromagnetic Stability*, Oxford, ch. II.
 * - Nield, D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 *
 * @param problem - boundaries and operating point (see marginalFactor)
 * @param options - wavenumberMin [1/d] > 0 (default 0.1), wavenumberMax [1/d] > wavenumberMin
 *                  (default 8), points integer 2–10 000 (default 80)
 * @returns wavenumber [1/d], factor λ [-] (Infinity where no stationary mode), rayleigh and
 *          marangoni [-] on the curve (±Infinity where λ is infinite, 0 where the drive is 0)
 * @throws RangeError naming the field when an input is non-finite or out of range
 * @example neutralCurve({ bottom: 'free', bottomThermal: 'conducting', top: 'free', biot: Infinity, rayleigh: 1, marangoni: 0 }, { wavenumberMin: 2, wavenumberMax: 2.5, points: 2 }).rayleigh // ≈ [667.010, 670.167] ((π² + k²)³/k²)
 */
export function neutralCurve(problem: StabilityProblem, options: NeutralCurveOptions = {}): NeutralCurve {
  const checked = validateProblem(problem);
  const wavenumberMin = options.wavenumberMin ?? 0.1;
  const wavenumberMax = options.wavenumberMax ?? 8;
  const points = options.points ?? 80;
  if (typeof wavenumberMin !== 'number' || !Number.isFinite(wavenumberMin) || wavenumberMin <= 0)
    throw new RangeError(`wavenumberMin must be a finite number > 0 [1/d], got ${String(wavenumberMin)}`);
  if (typeof wavenumberMax !== 'number' || !Number.isFinite(wavenumberMax) || wavenumberMax <= wavenumberMin)
    throw new RangeError(`wavenumberMax must be a finite number > wavenumberMin (${wavenumberMin}) [1/d], got ${String(wavenumberMax)}`);
  if (!Number.isInteger(points) || points < 2 || points > 10_000)
    throw new RangeError(`points must be an integer from 2 to 10000, got ${String(points)}`);
  const evaluate = createMarginalFactorEvaluator(checked);
  const curve: NeutralCurve = { wavenumber: [], factor: [], rayleigh: [], marangoni: [] };
  for (let i = 0; i < points; i++) {
    const k = wavenumberMin + ((wavenumberMax - wavenumberMin) * i) / (points - 1);
    const factor = evaluate(k);
    curve.wavenumber.push(k);
    curve.factor.push(factor);
    curve.rayleigh.push(scaleDrive(factor, problem.rayleigh));
    curve.marangoni.push(scaleDrive(factor, problem.marangoni));
  }
  return curve;
}

function scaleDrive(factor: number, drive: number): number {
  return drive === 0 ? 0 : factor * drive;
}
