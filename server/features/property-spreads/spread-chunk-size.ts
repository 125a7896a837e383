/** Samples per random-number block of the physics core's spread plan (chunks start on multiples of it). */
export const SPREAD_BLOCK_SIZE = 1000;
/** A queued run is cut into about this many stored chunks (progress steps, restart points). */
const TARGET_CHUNKS = 20;
/** Largest stored chunk, so one chunk never holds the worker for long. */
const MAX_CHUNK = 50_000;

/**
 * Samples per stored chunk of a queued Property spread: about 1/20 of the run, a whole number of
 * random-number blocks, between one block and 50 000 samples.
 *
 * @param samples - samples in the run
 * @returns chunk size [samples]
 * @example spreadChunkSize(20_000) // 1000
 * @example spreadChunkSize(1_000_000) // 50000
 */
export function spreadChunkSize(samples: number): number {
  const blocks = Math.ceil(samples / SPREAD_BLOCK_SIZE / TARGET_CHUNKS);
  return Math.min(MAX_CHUNK, Math.max(1, blocks) * SPREAD_BLOCK_SIZE);
}
