import { describe, expect, it } from 'vitest';
import { bracketMinimumNear } from './bracket-minimum-near';
import { refineBracketedMinimum } from './refine-bracketed-minimum';

// f(k) = (k² + 1)³/k² has its only minimum at k² = 1/2 with f = 6.75 (calculus: with x = k²,
// d/dx (x + 1)³/x = 0 gives 3x = x + 1). The free/free neutral curve (π² + k²)³/k² has the same form
// (Chandrasekhar 1961, §15: k_c = π/√2, Ra_c = 27π⁴/4).
const model = (k: number) => (k * k + 1) ** 3 / (k * k);
const freeFree = (k: number) => (Math.PI ** 2 + k * k) ** 3 / (k * k);

describe('bracketMinimumNear', () => {
  it('brackets the minimum with the three points around a good hint', () => {
    const bracket = bracketMinimumNear(model, 0.7, 0.01, 60)!;
    expect(bracket).not.toBeNull();
    const [lower, middle, upper] = bracket;
    expect(lower[0]).toBeLessThan(Math.log(Math.SQRT1_2));
    expect(upper[0]).toBeGreaterThan(Math.log(Math.SQRT1_2));
    expect(middle[1]).toBeLessThanOrEqual(Math.min(lower[1], upper[1]));
  });

  it('walks downhill from a poor hint and still brackets the minimum', () => {
    for (const hint of [0.2, 3, 20]) {
      const [lower, middle, upper] = bracketMinimumNear(model, hint, 0.01, 60)!;
      expect(lower[0]).toBeLessThan(Math.log(Math.SQRT1_2));
      expect(upper[0]).toBeGreaterThan(Math.log(Math.SQRT1_2));
      expect(middle[1]).toBeLessThanOrEqual(Math.min(lower[1], upper[1]));
    }
  });

  it('gives up (null) when λ keeps falling past its reach, on an infinite value, a minimum at the range end, or a hint outside the range', () => {
    expect(bracketMinimumNear((k) => k, 50, 1e-9, 1e9)).toBeNull();
    expect(bracketMinimumNear((k) => (k > 1 ? Infinity : model(k)), 0.99, 0.01, 60)).toBeNull();
    expect(bracketMinimumNear((k) => 48 + k * k, 0.05, 0.01, 60)).toBeNull();
    expect(bracketMinimumNear(model, 0.005, 0.01, 60)).toBeNull();
    expect(bracketMinimumNear(model, Number.NaN, 0.01, 60)).toBeNull();
  });
});

describe('refineBracketedMinimum', () => {
  it('finds k = 1/√2, f = 6.75 from a wide bracket (calculus)', () => {
    const at = (k: number) => [Math.log(k), model(k)] as const;
    const minimum = refineBracketedMinimum(model, at(0.3), at(0.9), at(2));
    expect(Math.abs(minimum.wavenumber / Math.SQRT1_2 - 1)).toBeLessThan(3e-4);
    expect(Math.abs(minimum.factor / 6.75 - 1)).toBeLessThan(1e-7);
  });

  it('stops early from a narrow bracket and keeps free/free Ra_c = 27π⁴/4 to 1e-7 at k_c = π/√2 (Chandrasekhar 1961 §15)', () => {
    let calls = 0;
    const counted = (k: number) => {
      calls += 1;
      return freeFree(k);
    };
    const s = Math.log(Math.PI / Math.SQRT2) + 0.004;
    const bracket = [s - 0.015, s, s + 0.015].map((x) => [x, freeFree(Math.exp(x))] as const);
    const minimum = refineBracketedMinimum(counted, bracket[0], bracket[1], bracket[2]);
    expect(Math.abs(minimum.factor / ((27 * Math.PI ** 4) / 4) - 1)).toBeLessThan(1e-7);
    expect(Math.abs(minimum.wavenumber - Math.PI / Math.SQRT2)).toBeLessThan(1e-3);
    expect(calls).toBeLessThanOrEqual(2);
  });
});
