import { requirePositive } from '../groups/require-positive';
import type { AndradeViscosityLaw } from './andrade-viscosity';

/** A fitted Andrade law with its quality of fit. */
export interface AndradeViscosityFit extends AndradeViscosityLaw {
  /** Root-mean-square residual of ln μ [-] (0 for two points). */
  readonly rmsLogResidual: number;
  /** Number of points used. */
  readonly points: number;
}

/**
 * Fit the Andrade law μ = A·exp(B/T) to two or more measured (temperature, viscosity) points.
 *
 * ## Method
 * Ordinary least squares of ln μ on x = 1/T: B = Σ(x − x̄)(y − ȳ)/Σ(x − x̄)², ln A = ȳ − B x̄. With two
 * points the law passes through both exactly. Points must have at least two distinct temperatures.
 *
 * ## References
 * - Andrade E. N. da C. (1930) Nature 125, 309–310. doi:10.1038/125309b0
 * - Press W. H. et al. (2007) "Numerical Recipes", 3rd ed., Cambridge, §15.2 (straight-line fit).
 *
 * @param points - measurements, each temperature [K] > 0 and viscosity [Pa·s] > 0; at least two
 * @returns frozen fit: prefactor [Pa·s], activationTemperature [K], rmsLogResidual [-], points
 * @throws RangeError when fewer than two points or fewer than two distinct temperatures are given
 * @example fitAndradeViscosity([{ temperature: 300, viscosity: 1e-3 }, { temperature: 350, viscosity: 4e-4 }]).activationTemperature // ≈ 1924
 */
export function fitAndradeViscosity(points: readonly { temperature: number; viscosity: number }[]): AndradeViscosityFit {
  if (!Array.isArray(points) || points.length < 2) {
    throw new RangeError(`points must hold at least 2 (temperature, viscosity) pairs, got ${points?.length ?? 0}`);
  }
  const xs = points.map((p, i) => 1 / requirePositive(`points[${i}].temperature`, p.temperature, 'K'));
  const ys = points.map((p, i) => Math.log(requirePositive(`points[${i}].viscosity`, p.viscosity, 'Pa·s')));
  const n = xs.length;
  const xMean = xs.reduce((s, x) => s + x, 0) / n;
  const yMean = ys.reduce((s, y) => s + y, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i += 1) {
    sxx += (xs[i] - xMean) ** 2;
    sxy += (xs[i] - xMean) * (ys[i] - yMean);
  }
  if (!(sxx > 0)) throw new RangeError('points must include at least two different temperatures');
  const activationTemperature = sxy / sxx;
  const logPrefactor = yMean - activationTemperature * xMean;
  let squares = 0;
  for (let i = 0; i < n; i += 1) squares += (ys[i] - (logPrefactor + activationTemperature * xs[i])) ** 2;
  return Object.freeze({
    prefactor: Math.exp(logPrefactor),
    activationTemperature,
    rmsLogResidual: Math.sqrt(squares / n),
    points: n,
  });
}
