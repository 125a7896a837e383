import { nextSplitMix64 } from './next-split-mix64';
import type { Xoshiro128State } from './random-state';

/**
 * A fresh xoshiro128** state expanded from an integer seed, so that the same seed always gives
 * the same stream of numbers.
 *
 * ## Method
 * Two SplitMix64 outputs started from the seed fill the four 32-bit words (low word first), the
 * seeding recommended by the generator's authors; it never yields the forbidden all-zero state
 * in practice, and that state is rejected if it ever appears.
 *
 * ## References
 * - Blackman D., Vigna S. (2021) "Scrambled linear pseudorandom number generators",
 *   ACM Trans. Math. Softw. 47(4):36. doi:10.1145/3460772
 * - Steele G. L., Lea D., Flood C. H. (2014) "Fast splittable pseudorandom number generators",
 *   OOPSLA '14. doi:10.1145/2714064.2660195
 *
 * @param seed - a non-negative safe integer (0 … 2⁵³ − 1) [-]
 * @returns a new generator state [-]
 * @example Array.from(seedXoshiro128State(0)) // [2065550767, 3793791033, 2713282036, 1853398634]
 */
export function seedXoshiro128State(seed: number): Xoshiro128State {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be a whole number from 0 to ${Number.MAX_SAFE_INTEGER}, got ${seed}`);
  }
  const first = nextSplitMix64(BigInt(seed));
  const second = nextSplitMix64(first.state);
  const state = new Uint32Array([
    Number(first.value & 0xffff_ffffn),
    Number(first.value >> 32n),
    Number(second.value & 0xffff_ffffn),
    Number(second.value >> 32n),
  ]);
  if ((state[0] | state[1] | state[2] | state[3]) === 0) {
    throw new RangeError(`seed ${seed} expands to the all-zero state, which xoshiro128** cannot use`);
  }
  return state;
}
