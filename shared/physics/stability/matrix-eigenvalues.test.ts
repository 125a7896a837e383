import { describe, expect, it } from 'vitest';
import { matrixEigenvalues } from './matrix-eigenvalues';

/** Companion matrix of the monic polynomial with the given roots: its eigenvalues are exactly those roots (algebra). */
function companion(roots: number[]): Float64Array {
  let c = [1];
  for (const r of roots) {
    const next = new Array(c.length + 1).fill(0);
    c.forEach((v, i) => {
      next[i] += v;
      next[i + 1] -= r * v;
    });
    c = next;
  }
  const n = roots.length;
  const a = new Float64Array(n * n);
  for (let j = 0; j < n; j++) a[j] = -c[j + 1];
  for (let i = 1; i < n; i++) a[i * n + i - 1] = 1;
  return a;
}

describe('matrixEigenvalues', () => {
  it('recovers the roots of a polynomial from its companion matrix', () => {
    const roots = [10, 7, 3, 0.5, -1.25, -2];
    const eig = matrixEigenvalues(companion(roots), roots.length)!;
    const found = [...eig.re].sort((x, y) => y - x);
    found.forEach((v, i) => expect(v).toBeCloseTo(roots[i], 9));
    eig.im.forEach((v) => expect(v).toBe(0));
  });

  it('returns a complex-conjugate pair for a rotation (eigenvalues ±i)', () => {
    const eig = matrixEigenvalues(new Float64Array([0, 1, -1, 0]), 2)!;
    expect([...eig.re]).toEqual([0, 0]);
    expect([...eig.im].sort()).toEqual([-1, 1]);
  });

  it('keeps the trace: the eigenvalues of a 12×12 matrix sum to its trace (linear algebra identity)', () => {
    const n = 12;
    const a = new Float64Array(n * n).map((_, i) => Math.sin(1.7 * i + 0.3));
    let trace = 0;
    for (let i = 0; i < n; i++) trace += a[i * n + i];
    const eig = matrixEigenvalues(a, n)!;
    expect(eig.re.reduce((s, v) => s + v, 0)).toBeCloseTo(trace, 10);
    expect(eig.im.reduce((s, v) => s + v, 0)).toBeCloseTo(0, 10);
  });

  it('handles a 1×1 matrix and a badly scaled diagonal', () => {
    expect(matrixEigenvalues(new Float64Array([4]), 1)!.re[0]).toBe(4);
    const eig = matrixEigenvalues(new Float64Array([1e8, 1, 0, 1e-8]), 2)!;
    expect([...eig.re].sort((x, y) => x - y)).toEqual([1e-8, 1e8]);
  });
});
