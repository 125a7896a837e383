import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dominantPositiveEigenvalue } from './dominant-eigenvalue';
import { matrixEigenvalues } from './matrix-eigenvalues';

const scratch = () => [new Float64Array(8), new Float64Array(8)] as const;

describe('dominantPositiveEigenvalue', () => {
  it('[[2, 1], [1, 3]]: (5 + √5)/2 (closed form of a symmetric 2×2; Golub & Van Loan 2013, §8.1)', () => {
    expect(dominantPositiveEigenvalue(new Float64Array([2, 1, 1, 3]), 2, ...scratch())).toBeCloseTo((5 + Math.sqrt(5)) / 2, 11);
  });

  it('gives NaN when the dominant eigenvalue is negative, a ± pair or a complex pair (the caller falls back)', () => {
    expect(dominantPositiveEigenvalue(new Float64Array([-4, 0, 0, 1]), 2, ...scratch())).toBeNaN();
    expect(dominantPositiveEigenvalue(new Float64Array([0, 1, 1, 0]), 2, ...scratch())).toBeNaN(); // eigenvalues ±1
    expect(dominantPositiveEigenvalue(new Float64Array([0, -1, 1, 0]), 2, ...scratch())).toBeNaN(); // eigenvalues ±i
    expect(dominantPositiveEigenvalue(new Float64Array([0, 0, 0, 0]), 2, ...scratch())).toBeNaN();
  });

  it('is not stopped by an all-ones eigenvector of the smaller eigenvalue: [[3, −2], [−2, 3]] has 1 (on [1, 1]) and 5', () => {
    expect(dominantPositiveEigenvalue(new Float64Array([3, -2, -2, 3]), 2, ...scratch())).toBeCloseTo(5, 11);
  });

  it('property: when it answers, it is the largest positive real eigenvalue the Hessenberg QR finds', () => {
    const matrix = fc.array(fc.integer({ min: -1000, max: 1000 }).map((x) => x / 1000), { minLength: 16, maxLength: 16 });
    fc.assert(
      fc.property(matrix, fc.integer({ min: 0, max: 50 }).map((x) => x / 10), (entries, shift) => {
        // Shifting the diagonal up makes a positive dominant eigenvalue common but not certain.
        const k = Float64Array.from(entries, (x, i) => (i % 5 === 0 ? x + shift : x));
        const mu = dominantPositiveEigenvalue(k, 4, ...scratch());
        if (Number.isNaN(mu)) return;
        const all = matrixEigenvalues(k, 4);
        expect(all).not.toBeNull();
        let largestReal = -Infinity;
        let largestSize = 0;
        all!.re.forEach((re, i) => {
          largestSize = Math.max(largestSize, Math.hypot(re, all!.im[i]));
          if (Math.abs(all!.im[i]) <= 1e-9 * Math.abs(re)) largestReal = Math.max(largestReal, re);
        });
        expect(Math.abs(mu / largestReal - 1)).toBeLessThan(1e-8);
        expect(Math.abs(mu / largestSize - 1)).toBeLessThan(1e-8);
      }),
      { numRuns: 400 },
    );
  });
});
