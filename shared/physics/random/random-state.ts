/**
 * Generator state of xoshiro128**: four unsigned 32-bit words, advanced in place by
 * {@link nextXoshiro128StarStar}. It is a plain typed array so that a caller can keep it in a
 * local variable, copy it (`Uint32Array.from(state)`) or store it as four numbers
 * (`Array.from(state)`) and resume a seeded run exactly where it stopped.
 *
 * ## References
 * - Blackman D., Vigna S. (2021) "Scrambled linear pseudorandom number generators",
 *   ACM Trans. Math. Softw. 47(4):36. doi:10.1145/3460772
 */
export type Xoshiro128State = Uint32Array;
