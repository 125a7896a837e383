import { nextUniform } from './next-uniform';
import type { Xoshiro128State } from './random-state';

/**
 * A standard normal variate (mean 0, variance 1); advances `state` by four steps.
 *
 * ## Method
 * Box–Muller: z = √(−2 ln u₁)·cos(2π u₂) with u₁ = 1 − U₁ ∈ (0, 1] (so ln never sees 0) and
 * u₂ = U₂ ∈ [0, 1). The companion sine variate is dropped so that every call consumes a fixed
 * number of generator steps and no hidden spare has to be carried in the state.
 *
 * ## References
 * - Box G. E. P., Muller M. E. (1958) "A note on the generation of random normal deviates",
 *   Ann. Math. Stat. 29(2):610–611. doi:10.1214/aoms/1177706645
 *
 * @param state - generator state, advanced in place [-]
 * @returns a draw from N(0, 1) [-]
 * @example nextStandardNormal(seedXoshiro128State(1)) // a finite real number
 */
export function nextStandardNormal(state: Xoshiro128State): number {
  const u1 = 1 - nextUniform(state);
  const u2 = nextUniform(state);
  return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}
