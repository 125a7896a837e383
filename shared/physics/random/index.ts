/** Seeded pseudorandom numbers for the physics core: xoshiro128** with explicit state, no module state. */
export { jumpXoshiro128State } from './jump-xoshiro128-state';
export { nextSplitMix64 } from './next-split-mix64';
export { nextStandardNormal } from './next-standard-normal';
export { nextUniform } from './next-uniform';
export { nextXoshiro128StarStar } from './next-xoshiro128-star-star';
export type { Xoshiro128State } from './random-state';
export { seedXoshiro128State } from './seed-xoshiro128-state';
