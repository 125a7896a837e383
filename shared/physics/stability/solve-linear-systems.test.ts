import { describe, expect, it } from 'vitest';
import { solveLinearSystems } from './solve-linear-systems';

describe('solveLinearSystems', () => {
  it('solves a system that needs pivoting, for two right-hand sides', () => {
    // [[0, 2], [1, 1]]·x = b with b = (4, 3) and (2, 5): x = (1, 2) and (4, 1)
    const x = solveLinearSystems(new Float64Array([0, 2, 1, 1]), 2, new Float64Array([4, 2, 3, 5]), 2)!;
    expect([...x]).toEqual([1, 4, 2, 1]);
  });
  it('returns null for a singular matrix', () => {
    expect(solveLinearSystems(new Float64Array([1, 2, 2, 4]), 2, new Float64Array([1, 1]), 1)).toBeNull();
  });
  it('leaves its inputs unchanged', () => {
    const a = new Float64Array([3, 1, 1, 2]);
    const b = new Float64Array([9, 8]);
    solveLinearSystems(a, 2, b, 1);
    expect([...a]).toEqual([3, 1, 1, 2]);
    expect([...b]).toEqual([9, 8]);
  });
});
