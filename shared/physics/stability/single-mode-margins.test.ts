import { describe, expect, it } from 'vitest';
import { flatCellularMinimum } from './cellular-margin';
import { longWaveMargin } from './long-wave-margin';
import { onsetMargin } from './onset-margin';
import type { StabilityProblem } from './types';
import { validateProblem } from './validate-problem';

const relative = (a: number, b: number) => Math.abs(a / b - 1);
const surface = { bottom: 'rigid', bottomThermal: 'conducting', top: 'surface' } as const;

describe('flatCellularMinimum: the flat cellular mode on its own', () => {
  it('Pearson Bi = 0, rigid conducting bottom: Ma_c = 79.607 (Pearson 1958, J. Fluid Mech. 4, 489–500)', () => {
    const minimum = flatCellularMinimum(validateProblem({ ...surface, biot: 0, rayleigh: 0, marangoni: 40 }), undefined);
    expect(relative(minimum.factor * 40, 79.607)).toBeLessThan(1e-5);
    // Pearson's k_c at Bi = 0 is 1.993 (same paper).
    expect(Math.abs(minimum.wavenumber - 1.993)).toBeLessThan(2e-3);
  });

  it('rigid/free conducting, Ra only: Ra_c = 1100.65 (Chandrasekhar 1961, Hydrodynamic and Hydromagnetic Stability, ch. II; Reid & Harris 1958, Phys. Fluids 1, 102)', () => {
    const problem = { bottom: 'rigid', bottomThermal: 'conducting', top: 'free', biot: Infinity, rayleigh: 1000, marangoni: 0 } as const;
    expect(relative(flatCellularMinimum(validateProblem(problem), undefined).factor * 1000, 1100.65)).toBeLessThan(1e-5);
  });

  it('is the cellMargin of the full onset solve, deformable surface or not, with or without a hint', () => {
    const problems: StabilityProblem[] = [
      { ...surface, biot: 0.1, rayleigh: 300, marangoni: 40 },
      { ...surface, biot: 0.1, rayleigh: 300, marangoni: 40, crispation: 1e-3, bond: 0.1 },
      { ...surface, biot: 2, rayleigh: 50, marangoni: 400, crispation: 1e-5, bond: 0.5 },
    ];
    for (const problem of problems) {
      const full = onsetMargin(problem);
      const alone = flatCellularMinimum(validateProblem(problem), undefined);
      expect(alone.factor).toBe(full.cellMargin);
      expect(alone.wavenumber).toBe(full.cellWavenumber);
      const hinted = onsetMargin(problem, { wavenumberHint: 2.5 });
      expect(flatCellularMinimum(validateProblem(problem), 2.5).factor).toBe(hinted.cellMargin);
    }
  });
});

describe('longWaveMargin: the long-wave mode on its own', () => {
  it('Ra = 0: λ·Ma = (2/3)·Ga·(1 + Bi) (VanHook et al. 1997, J. Fluid Mech. 345, 45–78)', () => {
    for (const [biot, crispation, bond] of [
      [0, 1e-4, 0.1],
      [0.5, 1e-5, 0.3],
    ] as const) {
      const margin = longWaveMargin(validateProblem({ ...surface, biot, rayleigh: 0, marangoni: 1, crispation, bond }));
      const galileo = bond / crispation;
      expect(relative(margin, (2 / 3) * galileo * (1 + biot))).toBeLessThan(1e-5);
    }
  });

  it('is the longWaveMargin of the full onset solve, and Infinity for a flat surface', () => {
    const problem = { ...surface, biot: 0.3, rayleigh: 120, marangoni: 60, crispation: 2e-4, bond: 0.2 };
    expect(longWaveMargin(validateProblem(problem))).toBe(onsetMargin(problem).longWaveMargin);
    expect(longWaveMargin(validateProblem({ ...surface, biot: 0.3, rayleigh: 120, marangoni: 60 }))).toBe(Infinity);
  });
});
