import { describe, expect, it } from 'vitest';
import { histogramPercentile } from './histogram-percentile';
import { marginHistogramBin } from './margin-histogram-bin';
import { percentileType7 } from './percentile-type7';
import { spearmanRankCorrelation } from './spearman-rank-correlation';
import { wilsonScoreInterval } from './wilson-score-interval';

// Sources: tests/fixtures/spread-sources.md.

describe('percentileType7', () => {
  it('gives 1.45, 5.5 and 9.55 for 1…10 at p = 0.05, 0.5, 0.95 (Hyndman & Fan 1996 type 7, hand-worked)', () => {
    const data = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
    expect(percentileType7(data, 0.05)).toBeCloseTo(1.45, 12);
    expect(percentileType7(data, 0.5)).toBeCloseTo(5.5, 12);
    expect(percentileType7(data, 0.95)).toBeCloseTo(9.55, 12);
  });

  it('returns the extremes at p = 0 and 1 and the only value of a single-value sample', () => {
    expect(percentileType7([2, 4, 8], 0)).toBe(2);
    expect(percentileType7([2, 4, 8], 1)).toBe(8);
    expect(percentileType7([3], 0.37)).toBe(3);
  });

  it('rejects an empty sample or p outside [0, 1]', () => {
    expect(() => percentileType7([], 0.5)).toThrow(/at least one value/);
    expect(() => percentileType7([1, 2], 1.2)).toThrow(/probability must be from 0 to 1/);
  });
});

describe('wilsonScoreInterval', () => {
  it('gives (0, 0.27754) for 0 of 10 at 95 % (Wilson 1927, closed form z²/(n + z²))', () => {
    const [lo, hi] = wilsonScoreInterval(0, 10, 1.959964);
    expect(lo).toBe(0);
    expect(hi).toBeCloseTo(3.841459 / 13.841459, 5);
  });

  it('gives (0.23659, 0.76341) for 5 of 10 at 95 % (hand calculation from Wilson 1927)', () => {
    const [lo, hi] = wilsonScoreInterval(5, 10, 1.959964);
    expect(lo).toBeCloseTo(0.23659, 4);
    expect(hi).toBeCloseTo(0.76341, 4);
  });

  it('rejects successes above trials, naming the field', () => {
    expect(() => wilsonScoreInterval(11, 10, 1.96)).toThrow(/successes must be a whole number from 0 to 10/);
    expect(() => wilsonScoreInterval(0, 0, 1.96)).toThrow(/trials/);
  });
});

describe('spearmanRankCorrelation', () => {
  it('is 1 for any increasing relation and −1 for a decreasing one (Spearman 1904)', () => {
    expect(spearmanRankCorrelation([1, 2, 3, 4], [1, 4, 9, 16])).toBeCloseTo(1, 12);
    expect(spearmanRankCorrelation([1, 2, 3, 4], [5, 1, 0.5, -7])).toBeCloseTo(-1, 12);
  });

  it('matches the textbook d² formula 1 − 6Σd²/(n(n² − 1)) for data without ties', () => {
    // x ranks 1..5, y ranks 2,1,4,3,5 → Σd² = 1+1+1+1+0 = 4 → 1 − 24/120 = 0.8.
    expect(spearmanRankCorrelation([10, 20, 30, 40, 50], [2, 1, 4, 3, 5])).toBeCloseTo(0.8, 12);
  });

  it('uses average ranks for ties and returns 0 for a constant sample', () => {
    // y ranks (1.5, 1.5, 3): Pearson of (1,2,3) with (1.5,1.5,3) = 0.8660254 (√3/2, hand-worked).
    expect(spearmanRankCorrelation([1, 2, 3], [7, 7, 9])).toBeCloseTo(Math.sqrt(3) / 2, 12);
    expect(spearmanRankCorrelation([1, 2, 3], [4, 4, 4])).toBe(0);
  });
});

describe('histogram bins and percentiles', () => {
  const spec = { lowerDecade: -6, upperDecade: 6, binsPerDecade: 1000 };

  it('puts margin 1 at the start of decade 0 and sends ≤ 0 and huge margins to the end slots', () => {
    expect(marginHistogramBin(1, spec)).toBe(6001);
    expect(marginHistogramBin(0, spec)).toBe(0);
    expect(marginHistogramBin(-3, spec)).toBe(0);
    expect(marginHistogramBin(1e7, spec)).toBe(12_001);
    expect(marginHistogramBin(Number.MAX_VALUE, spec)).toBe(12_001);
  });

  it('recovers the type-7 percentile of known data within one bin (0.23 %)', () => {
    const data = Array.from({ length: 999 }, (_, i) => 0.5 + i * 0.002); // 0.5 … 2.496
    const counts = new Array<number>(12_002).fill(0);
    for (const v of data) counts[marginHistogramBin(v, spec)] += 1;
    for (const p of [0.05, 0.5, 0.95]) {
      const exact = percentileType7(data, p);
      const binned = histogramPercentile(counts, spec, p, { minimum: 0.5, maximum: 2.496 });
      expect(Math.abs(binned / exact - 1)).toBeLessThan(10 ** 0.001 - 1);
    }
  });
});
