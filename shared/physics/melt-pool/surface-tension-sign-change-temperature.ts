import { FE_S_ADSORPTION_PARAMETERS, type SoluteAdsorptionParameters } from './fe-s-adsorption-parameters';
import { surfaceTensionTemperatureDerivative } from './surface-tension-temperature-derivative';

/** Outcome of the search for the temperature where dγ/dT = 0. */
export type SignChangeResult =
  | { readonly found: true; readonly temperature: number }
  | {
      readonly found: false;
      /** Sign of dγ/dT everywhere in the searched range. */
      readonly slopeSign: 'negative' | 'positive';
      readonly message: string;
    };

const SCAN_INTERVALS = 256;

/**
 * Temperature at which dγ/dT of a metal with a surface-active solute changes sign (the lowest
 * one in the range), or a plain statement that it keeps one sign there.
 *
 * ## Method
 * dγ/dT from `surfaceTensionTemperatureDerivative` is scanned on 256 equal sub-intervals of
 * [lower, upper]; the first sub-interval whose ends differ in sign is refined by bisection to
 * 10⁻⁹ K (about 40 halvings — slow but cannot diverge). For Fe–S, dγ/dT > 0 below and < 0 above
 * this temperature, and it rises with sulfur activity.
 *
 * ## References
 * - Sahoo P., DebRoy T., McNallan M. J. (1988) Metall. Trans. B 19(3):483–491.
 *   doi:10.1007/BF02657748
 * - Press W. H. et al. (2007) "Numerical Recipes", 3rd ed., Cambridge Univ. Press, §9.1
 *   (bracketing and bisection).
 *
 * @param activity - solute activity on the 1 wt % scale, ≥ 0 [wt %]
 * @param range - temperatures searched [K] (default 1809 K to 3000 K)
 * @param parameters - model constants (default Fe–S)
 * @returns the temperature [K], or that none lies in the range and the slope's sign there
 * @example surfaceTensionSignChangeTemperature(0.01).found // true (≈ 1966 K for 100 ppm S)
 */
export function surfaceTensionSignChangeTemperature(
  activity: number,
  range: { readonly lower: number; readonly upper: number } = { lower: 1809, upper: 3000 },
  parameters: SoluteAdsorptionParameters = FE_S_ADSORPTION_PARAMETERS,
): SignChangeResult {
  const { lower, upper } = range;
  if (!(lower > 0 && Number.isFinite(lower))) throw new RangeError(`range.lower must be a finite number > 0 K, got ${lower}`);
  if (!(upper > lower && Number.isFinite(upper))) {
    throw new RangeError(`range.upper must be a finite number above range.lower (${lower} K), got ${upper}`);
  }
  const slope = (t: number) => surfaceTensionTemperatureDerivative(t, activity, parameters);
  const step = (upper - lower) / SCAN_INTERVALS;
  let a = lower;
  let fa = slope(a);
  if (fa === 0) return Object.freeze({ found: true as const, temperature: a });
  for (let i = 1; i <= SCAN_INTERVALS; i += 1) {
    const b = i === SCAN_INTERVALS ? upper : lower + i * step;
    const fb = slope(b);
    if (fb === 0) return Object.freeze({ found: true as const, temperature: b });
    if (fa * fb < 0) {
      let lo = a;
      let hi = b;
      let flo = fa;
      while (hi - lo > 1e-9) {
        const mid = 0.5 * (lo + hi);
        const fm = slope(mid);
        if (fm === 0) return Object.freeze({ found: true as const, temperature: mid });
        if (flo * fm < 0) {
          hi = mid;
        } else {
          lo = mid;
          flo = fm;
        }
      }
      return Object.freeze({ found: true as const, temperature: 0.5 * (lo + hi) });
    }
    a = b;
    fa = fb;
  }
  const slopeSign = fa < 0 ? ('negative' as const) : ('positive' as const);
  return Object.freeze({
    found: false as const,
    slopeSign,
    message:
      `dγ/dT stays ${slopeSign} from ${lower} K to ${upper} K at activity ${activity} wt %: ` +
      (slopeSign === 'negative'
        ? 'surface tension falls with temperature throughout, so the surface flow runs outward.'
        : 'surface tension rises with temperature throughout, so the surface flow runs inward.'),
  });
}
