import { describe, expect, it } from 'vitest';
import { criticalMarangoni } from '../stability';
import { createCriticalMarangoniTable } from './create-critical-marangoni-table';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('createCriticalMarangoniTable', () => {
  it('reproduces the published flat-surface critical values at Bi = 0', () => {
    // Pearson J.R.A. (1958) J. Fluid Mech. 4:489: conducting bottom, Bi = 0 → Ma_c = 79.607.
    expect(rel(createCriticalMarangoniTable('conducting')(0), 79.607)).toBeLessThan(1e-4);
    // Insulating bottom, Bi = 0 → Ma_c = 48 as k → 0 (long-wave limit; project reference notes after Nield 1964).
    expect(rel(createCriticalMarangoniTable('insulating')(0), 48)).toBeLessThan(1e-4);
  });

  it('rises to Pearson’s Bi = 1 value, 116.13 (conducting bottom)', () => {
    expect(rel(createCriticalMarangoniTable('conducting')(1), 116.13)).toBeLessThan(1e-3);
  });

  it('interpolates between grid points within 0.5 % of a direct solve', () => {
    // Reference: the stability solver called directly at the same Bi (the interpolation is what is tested).
    for (const bottomThermal of ['conducting', 'insulating'] as const) {
      const table = createCriticalMarangoniTable(bottomThermal);
      for (const bi of [3.7e-7, 2.3e-5, 4.1e-3, 0.037, 0.61, 2.9, 17.3, 460, 8.8e4]) {
        const direct = criticalMarangoni({ bottom: 'rigid', bottomThermal, top: 'surface', biot: bi }).value;
        expect([bottomThermal, bi, rel(table(bi), direct) < 5e-3]).toEqual([bottomThermal, bi, true]);
      }
    }
  });

  it('rejects a negative or non-finite Biot number', () => {
    const table = createCriticalMarangoniTable('conducting');
    expect(() => table(-1)).toThrow(/biot must be/);
    expect(() => table(Number.NaN)).toThrow(/biot must be/);
  });
});
