import type { Xoshiro128State } from './random-state';

/**
 * Next 32-bit output of the xoshiro128** generator; advances `state` in place (the only
 * side effect — there is no module-level state).
 *
 * ## Method
 * output = rotl(s₁·5, 7)·9 (mod 2³²); then t = s₁≪9, s₂ ^= s₀, s₃ ^= s₁, s₁ ^= s₂, s₀ ^= s₃,
 * s₂ ^= t, s₃ = rotl(s₃, 11). Period 2¹²⁸ − 1; passes BigCrush per its authors.
 *
 * ## References
 * - Blackman D., Vigna S. (2021) "Scrambled linear pseudorandom number generators",
 *   ACM Trans. Math. Softw. 47(4):36. doi:10.1145/3460772
 *
 * @param state - generator state (four uint32 words, not all zero), modified in place [-]
 * @returns an unsigned 32-bit integer, 0 … 2³² − 1 [-]
 * @example nextXoshiro128StarStar(new Uint32Array([1, 2, 3, 4])) // 11520
 */
export function nextXoshiro128StarStar(state: Xoshiro128State): number {
  const s0 = state[0];
  const s1 = state[1];
  const m = Math.imul(s1, 5);
  const r = (m << 7) | (m >>> 25);
  const result = Math.imul(r, 9) >>> 0;
  const t = s1 << 9;
  const s2 = state[2] ^ s0;
  const s3 = state[3] ^ s1;
  state[1] = s1 ^ s2;
  state[0] = s0 ^ s3;
  state[2] = s2 ^ t;
  state[3] = (s3 << 11) | (s3 >>> 21);
  return result;
}
