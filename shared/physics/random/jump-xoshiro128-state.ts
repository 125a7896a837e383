import { nextXoshiro128StarStar } from './next-xoshiro128-star-star';
import type { Xoshiro128State } from './random-state';

/** Jump polynomial for 2⁶⁴ steps, from the authors' reference code (xoshiro128starstar.c). */
const JUMP_2_64 = [0x8764000b, 0xf542d2d3, 0x6fa035c3, 0x77f2db5b] as const;

/**
 * Advances a xoshiro128** state by 2⁶⁴ steps in place, giving a stream that cannot overlap the
 * next 2⁶⁴ outputs of the original — used to give each block of Property-spread samples its own
 * stream so that blocks can run in any order or on different workers.
 *
 * ## Method
 * The state transition is linear over GF(2), so Tⁿ·s equals p(T)·s where p(x) = xⁿ mod the
 * characteristic polynomial; the XOR of the states met while stepping through the set bits of
 * p's coefficients (the JUMP constants) is the jumped state.
 *
 * ## References
 * - Blackman D., Vigna S. (2021) "Scrambled linear pseudorandom number generators",
 *   ACM Trans. Math. Softw. 47(4):36, §§3–4 (jump functions). doi:10.1145/3460772
 * - Haramoto H., Matsumoto M., Nishimura T., Panneton F., L'Ecuyer P. (2008) "Efficient jump
 *   ahead for F₂-linear random number generators", INFORMS J. Comput. 20(3):385–390.
 *   doi:10.1287/ijoc.1070.0251
 *
 * @param state - generator state, replaced in place by the state 2⁶⁴ steps later [-]
 * @returns the same array, for chaining [-]
 * @example jumpXoshiro128State(seedXoshiro128State(7)) // state 2⁶⁴ draws ahead
 */
export function jumpXoshiro128State(state: Xoshiro128State): Xoshiro128State {
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  let s3 = 0;
  for (const word of JUMP_2_64) {
    for (let bit = 0; bit < 32; bit += 1) {
      if ((word >>> bit) & 1) {
        s0 ^= state[0];
        s1 ^= state[1];
        s2 ^= state[2];
        s3 ^= state[3];
      }
      nextXoshiro128StarStar(state);
    }
  }
  state[0] = s0;
  state[1] = s1;
  state[2] = s2;
  state[3] = s3;
  return state;
}
