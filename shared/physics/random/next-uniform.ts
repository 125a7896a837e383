import { nextXoshiro128StarStar } from './next-xoshiro128-star-star';
import type { Xoshiro128State } from './random-state';

/**
 * A uniform variate on [0, 1) with the full 53-bit resolution of a double; advances `state`
 * by two steps.
 *
 * ## Method
 * u = (a≫5 · 2²⁶ + b≫6) / 2⁵³ from two 32-bit outputs a, b — every multiple of 2⁻⁵³ in [0, 1)
 * equally likely.
 *
 * ## References
 * - Matsumoto M., Nishimura T. (1998) "Mersenne twister: a 623-dimensionally equidistributed
 *   uniform pseudo-random number generator", ACM TOMACS 8(1):3–30 (genrand_res53 construction).
 *   doi:10.1145/272991.272995
 * - Blackman D., Vigna S. (2021) ACM Trans. Math. Softw. 47(4):36 (generator). doi:10.1145/3460772
 *
 * @param state - generator state, advanced in place [-]
 * @returns a number u with 0 ≤ u < 1 [-]
 * @example nextUniform(seedXoshiro128State(1)) // a number in [0, 1)
 */
export function nextUniform(state: Xoshiro128State): number {
  const a = nextXoshiro128StarStar(state) >>> 5;
  const b = nextXoshiro128StarStar(state) >>> 6;
  return (a * 67_108_864 + b) / 9_007_199_254_740_992;
}
