import { describe, expect, it } from 'vitest';
import { SPREAD_BLOCK_SIZE, spreadChunkSize } from './spread-chunk-size';

describe('spreadChunkSize', () => {
  it('cuts a run into about 20 stored chunks of whole random-number blocks, at most 50 000 samples', () => {
    expect(spreadChunkSize(20_000)).toBe(1000);
    expect(spreadChunkSize(40_000)).toBe(2000);
    expect(spreadChunkSize(1_000_000)).toBe(50_000);
    expect(spreadChunkSize(10_001)).toBe(1000);
    for (const samples of [10_001, 12_345, 99_999, 250_000, 1_000_000]) {
      const size = spreadChunkSize(samples);
      expect(size % SPREAD_BLOCK_SIZE).toBe(0);
      expect(Math.ceil(samples / size)).toBeLessThanOrEqual(21);
    }
  });
});
