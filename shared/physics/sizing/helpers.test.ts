import { describe, expect, it } from 'vitest';
import { findDepthCrossing } from './find-depth-crossing';
import { findRootBrent } from './find-root-brent';
import { pchipInterpolate } from './pchip-interpolate';
import { sampleDepthOnsets } from './sample-depth-onsets';

describe('findRootBrent (Brent 1973, ch. 4)', () => {
  it('finds √2 as the root of x² − 2 in [0, 2]', () => {
    const r = findRootBrent((x) => x * x - 2, 0, 2, { tolerance: 1e-14 });
    expect(Math.abs(r.root - Math.SQRT2)).toBeLessThan(1e-13);
    expect(r.converged).toBe(true);
  });
  it('finds the root of cos x − x (Dottie number 0.7390851332, a known constant)', () => {
    expect(Math.abs(findRootBrent((x) => Math.cos(x) - x, 0, 1, { tolerance: 1e-14 }).root - 0.7390851332151607)).toBeLessThan(1e-12);
  });
  it('refuses an unbracketed interval', () => {
    expect(() => findRootBrent((x) => x * x + 1, -1, 1)).toThrow(/not bracketed/);
  });
});

describe('pchipInterpolate (Fritsch & Carlson 1980)', () => {
  it('reproduces the nodes and a straight line exactly', () => {
    const xs = [0, 1, 3, 4];
    const ys = xs.map((x) => 2 * x + 1);
    expect(pchipInterpolate(xs, ys, 3)).toBeCloseTo(7, 14);
    expect(pchipInterpolate(xs, ys, 2.2)).toBeCloseTo(5.4, 12);
  });
  it('does not overshoot monotone data with a step', () => {
    const xs = [0, 1, 2, 3];
    const ys = [0, 0, 1, 1];
    for (let x = 0; x <= 3; x += 0.1) {
      const y = pchipInterpolate(xs, ys, x);
      expect(y).toBeGreaterThanOrEqual(-1e-12);
      expect(y).toBeLessThanOrEqual(1 + 1e-12);
    }
  });
});

describe('findDepthCrossing on margins with a known crossing', () => {
  const base = { minDepth: 1e-7, maxDepth: 10, modeName: 'cells' };
  it('finds the depth where a buoyancy-like margin (1 mm / d)³ crosses 1, from either side', () => {
    for (const startDepth of [1e-5, 1e-3 * 0.999, 0.5]) {
      const r = findDepthCrossing({ ...base, margin: (d) => (1e-3 / d) ** 3, startDepth, quietSide: 'below', stepPower: 3 });
      expect(r.found && Math.abs(r.depth / 1e-3 - 1)).toBeLessThan(1e-6);
    }
  });
  it('finds a lower bound for a long-wave-like margin (d / 50 µm)²', () => {
    const r = findDepthCrossing({ ...base, margin: (d) => (d / 50e-6) ** 2, startDepth: 1e-3, quietSide: 'above', stepPower: 2, modeName: 'thinning' });
    expect(r.found && Math.abs(r.depth / 50e-6 - 1)).toBeLessThan(1e-6);
  });
  it('says so when there is no onset in the range, or onset everywhere', () => {
    const none = findDepthCrossing({ ...base, margin: () => Infinity, startDepth: 1e-3, quietSide: 'below', stepPower: 3 });
    expect(none).toMatchObject({ found: false, reason: 'quiet-throughout-range', searchedTo: 10 });
    const always = findDepthCrossing({ ...base, margin: () => 0.5, startDepth: 1e-3, quietSide: 'below', stepPower: 3 });
    expect(always).toMatchObject({ found: false, reason: 'onset-throughout-range', searchedFrom: 1e-7 });
  });
});

describe('sampleDepthOnsets: adaptive sampling against direct evaluation', () => {
  it('interpolates smooth power-law margins within the tolerance using fewer solves', () => {
    const depths = Array.from({ length: 200 }, (_, i) => 1e-5 * 1000 ** (i / 199));
    const exact = (d: number) => {
      const cellMargin = 1 / (d / 1e-3 + (d / 2e-3) ** 3);
      const longWaveMargin = (d / 1e-4) ** 2;
      return { cellMargin, longWaveMargin, margin: Math.min(cellMargin, longWaveMargin), longWave: longWaveMargin < cellMargin };
    };
    let solves = 0;
    const sampled = sampleDepthOnsets(depths, (d) => { solves += 1; return exact(d); }, { tolerance: 1e-3 });
    expect(solves).toBeLessThan(120);
    depths.forEach((d, i) => {
      expect(Math.abs(sampled[i].margin / exact(d).margin - 1)).toBeLessThan(2e-3);
      expect(Math.abs(sampled[i].cellMargin / exact(d).cellMargin - 1)).toBeLessThan(2e-3);
    });
  });
  it('solves every depth where a margin is infinite on one side of a gap', () => {
    const depths = Array.from({ length: 50 }, (_, i) => 1e-4 * (1 + i));
    const sampled = sampleDepthOnsets(depths, (d) => {
      const m = d < 2e-3 ? 2 : Infinity;
      return { margin: m, cellMargin: m, longWaveMargin: Infinity, longWave: false };
    });
    depths.forEach((d, i) => (d < 2e-3 ? expect(sampled[i].margin).toBeCloseTo(2, 12) : expect(sampled[i].margin).toBe(Infinity)));
  });
});

describe('findDepthCrossing with zero margins', () => {
  it('treats a zero margin (onset at any ΔT) as onset, not as an error (found by property test)', () => {
    const r = findDepthCrossing({ minDepth: 1e-7, maxDepth: 10, modeName: 'thinning', margin: (d) => (d < 1e-4 ? 0 : 2), startDepth: 1e-6, quietSide: 'above', stepPower: 2 });
    expect(r.found && Math.abs(r.depth / 1e-4 - 1)).toBeLessThan(1e-5);
  });
});
