/**
 * Fit μ = A·exp(B/T) to measured viscosities by least squares in ln μ against 1/T.
 *
 * ## Method
 * ln μ = ln A + B·(1/T) is a straight line in x = 1/T; ordinary least squares gives B (slope) and
 * ln A (intercept). One point gives a constant viscosity (B = 0). The misfit is reported as the
 * root-mean-square relative error of the fitted μ at the points. Valid for Newtonian liquids away
 * from the glass transition.
 *
 * ## References
 * - Andrade E.N. da C. (1930) The viscosity of liquids. Nature 125:309–310. doi:10.1038/125309b0
 * - Reid R.C., Prausnitz J.M., Poling B.E. (1987) The Properties of Gases and Liquids, 4th ed., §9-10
 *   (ln μ = A + B/T for liquids below the normal boiling point).
 *
 * @param points - measured (temperature [K], viscosity [Pa·s]) pairs, ≥ 1, temperatures > 0
 * @returns A [Pa·s], B [K] and the rms relative misfit [-]
 * @throws RangeError for an empty list, non-positive values or two-plus points all at one temperature
 * @example fitAndradeViscosity([{ temperature: 293.15, viscosity: 1.0016e-3 }]) // { preExponential: 1.0016e-3, activationTemperature: 0, rmsRelativeError: 0 }
 */
export function fitAndradeViscosity(points: readonly { temperature: number; viscosity: number }[]): {
  preExponential: number;
  activationTemperature: number;
  rmsRelativeError: number;
} {
  if (points.length === 0) throw new RangeError('viscosity: give at least one point');
  for (const p of points) {
    if (!(p.temperature > 0)) throw new RangeError(`viscosity: temperature must be > 0 K, got ${p.temperature}`);
    if (!(p.viscosity > 0)) throw new RangeError(`viscosity: value must be > 0 Pa·s, got ${p.viscosity}`);
  }
  if (points.length === 1) {
    return { preExponential: points[0].viscosity, activationTemperature: 0, rmsRelativeError: 0 };
  }
  const n = points.length;
  const xs = points.map((p) => 1 / p.temperature);
  const ys = points.map((p) => Math.log(p.viscosity));
  const meanX = xs.reduce((s, x) => s + x, 0) / n;
  const meanY = ys.reduce((s, y) => s + y, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i += 1) {
    sxx += (xs[i] - meanX) ** 2;
    sxy += (xs[i] - meanX) * (ys[i] - meanY);
  }
  if (!(sxx > 0)) throw new RangeError('viscosity: two or more points need at least two different temperatures');
  const slope = sxy / sxx;
  const intercept = meanY - slope * meanX;
  const preExponential = Math.exp(intercept);
  let sumSq = 0;
  for (const p of points) {
    const fitted = preExponential * Math.exp(slope / p.temperature);
    sumSq += ((fitted - p.viscosity) / p.viscosity) ** 2;
  }
  return { preExponential, activationTemperature: slope, rmsRelativeError: Math.sqrt(sumSq / n) };
}
