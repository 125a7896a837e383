import { describe, expect, it } from 'vitest';
import { chebyshevCollocation } from './chebyshev-collocation';

describe('chebyshevCollocation', () => {
  const grid = chebyshevCollocation(12);
  const apply = (d: Float64Array, f: (z: number) => number) =>
    [...grid.z].map((_, i) => [...grid.z].reduce((s, z, j) => s + d[i * grid.size + j] * f(z), 0));

  it('places the nodes from the top z = 1 to the bottom z = 0', () => {
    expect(grid.z[0]).toBe(1);
    expect(grid.z[grid.size - 1]).toBeCloseTo(0, 15);
  });

  it('differentiates a degree-5 polynomial exactly (to round-off) up to the fourth derivative', () => {
    const f = (z: number) => z ** 5 - 2 * z ** 3 + z;
    const exact = [
      (z: number) => 5 * z ** 4 - 6 * z * z + 1,
      (z: number) => 20 * z ** 3 - 12 * z,
      (z: number) => 60 * z * z - 12,
      (z: number) => 120 * z,
    ];
    [grid.d1, grid.d2, grid.d3, grid.d4].forEach((d, n) => {
      apply(d, f).forEach((v, i) => expect(v).toBeCloseTo(exact[n](grid.z[i]), 6));
    });
  });

  it('is spectrally accurate for e^{3z}: first derivative to 1e-9 with 13 nodes', () => {
    apply(grid.d1, (z) => Math.exp(3 * z)).forEach((v, i) => expect(Math.abs(v - 3 * Math.exp(3 * grid.z[i]))).toBeLessThan(1e-9 * 60));
  });

  it('rejects an order below 4', () => {
    expect(() => chebyshevCollocation(3)).toThrow(/order/);
  });
});
