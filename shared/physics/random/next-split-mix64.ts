const GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;
const MASK_64 = 0xffff_ffff_ffff_ffffn;

/**
 * One step of the SplitMix64 generator, used only to expand a user seed into a full
 * xoshiro128** state (the seeding its authors recommend).
 *
 * ## Method
 * state ← state + 0x9E3779B97F4A7C15 (mod 2⁶⁴); z ← (z ⊕ z≫30)·0xBF58476D1CE4E5B9;
 * z ← (z ⊕ z≫27)·0x94D049BB133111EB; output z ⊕ z≫31, all arithmetic modulo 2⁶⁴.
 *
 * ## References
 * - Steele G. L., Lea D., Flood C. H. (2014) "Fast splittable pseudorandom number generators",
 *   OOPSLA '14, ACM SIGPLAN Notices 49(10):453–472. doi:10.1145/2714064.2660195
 * - Blackman D., Vigna S. (2021) "Scrambled linear pseudorandom number generators",
 *   ACM Trans. Math. Softw. 47(4):36 (seeding advice). doi:10.1145/3460772
 *
 * @param state - current 64-bit state, 0 ≤ state < 2⁶⁴ [-]
 * @returns the 64-bit output and the next state [-]
 * @example nextSplitMix64(1234567n).value // 6457827717110365317n
 */
export function nextSplitMix64(state: bigint): { readonly value: bigint; readonly state: bigint } {
  if (state < 0n || state > MASK_64) throw new RangeError(`state must be in [0, 2^64), got ${state}`);
  const next = (state + GOLDEN_GAMMA) & MASK_64;
  let z = next;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK_64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK_64;
  return Object.freeze({ value: z ^ (z >> 31n), state: next });
}
