import { describe, expect, it } from 'vitest';
import refs from '../../../tests/fixtures/stability-references.json';
import { onsetMargin } from './onset-margin';
import type { StabilityProblem } from './types';

const nieldLayer = { bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0 } as const;
const relative = (value: number, expected: number) => Math.abs(value - expected) / Math.abs(expected);

describe('onsetMargin: single drives', () => {
  it(`Ma alone at half of Pearson's 79.607 gives a margin of 2, quiet, surface-tension cells at k_c = 1.993 (${refs.pearson.source})`, () => {
    const result = onsetMargin({ ...nieldLayer, rayleigh: 0, marangoni: refs.pearson.marangoni / 2 });
    expect(relative(result.margin, 2)).toBeLessThan(1e-5);
    expect(Math.abs(result.criticalWavenumber - 1.993)).toBeLessThan(1e-3);
    expect(result.regime).toBe('quiet');
    expect(result.mechanism).toBe('surface-tension-cells');
    expect(result.buoyancyShare).toBe(0);
    expect(result.longWave).toBe(false);
    expect(result.longWaveMargin).toBe(Infinity);
  });

  it(`Ra alone at 1.25 × Nield's 669.00 gives a margin of 0.8 and buoyancy cells (${refs.nield.source})`, () => {
    const result = onsetMargin({ ...nieldLayer, rayleigh: refs.nield.rayleigh * 1.25, marangoni: 0 });
    expect(Math.abs(result.margin - 0.8)).toBeLessThan(1e-5);
    expect(result.regime).toBe('buoyancy-cells');
    expect(result.buoyancyShare).toBe(1);
    expect(relative(result.onsetRayleigh, refs.nield.rayleigh)).toBeLessThan(1e-5);
  });

  it('rigid/rigid conducting at Ra = 3415.524 (2 × 1707.762, Chandrasekhar 1961) has margin 0.5', () => {
    const result = onsetMargin({ bottom: 'rigid', bottomThermal: 'conducting', top: 'rigid', biot: Infinity, rayleigh: 3415.524, marangoni: 0 });
    expect(relative(result.margin, 0.5)).toBeLessThan(1e-5);
    expect(Math.abs(result.criticalWavenumber - 3.117)).toBeLessThan(1e-3);
  });

  it('both drives stabilising (heated from above): infinite margin, quiet, no mechanism (Chandrasekhar 1961; Pearson 1958)', () => {
    const result = onsetMargin({ ...nieldLayer, biot: 0.5, rayleigh: -500, marangoni: -50 });
    expect(result.margin).toBe(Infinity);
    expect(result.regime).toBe('quiet');
    expect(result.mechanism).toBe('none');
    expect(Number.isNaN(result.cellWavenumber)).toBe(true);
  });
});

describe("onsetMargin: coupled drives (Nield 1964)", () => {
  // Nield 1964, J. Fluid Mech. 19:341: on the coupled neutral curve Ra/Ra_c + Ma/Ma_c ≈ 1 (approximate), with
  // Ra_c = 669.00 (Nield) and Ma_c = 79.607 (Pearson 1958) for this layer. Loose tolerance: within 10 %.
  for (const buoyancyWeight of [0.1, 0.3, 0.5, 0.7, 0.9]) {
    it(`Ra/Ra_c + Ma/Ma_c is within 10 % of 1 at onset for weight ${buoyancyWeight}`, () => {
      const result = onsetMargin({
        ...nieldLayer,
        rayleigh: refs.nield.rayleigh * buoyancyWeight * 0.7,
        marangoni: refs.pearson.marangoni * (1 - buoyancyWeight) * 0.7,
      });
      const sum = result.onsetRayleigh / refs.nield.rayleigh + result.onsetMarangoni / refs.pearson.marangoni;
      expect(Math.abs(sum - 1)).toBeLessThan(0.1);
      // The drives reinforce each other (Nield 1964): onset comes before either drive alone would reach its threshold.
      expect(result.margin).toBeLessThan(1 / (0.7 * Math.max(buoyancyWeight, 1 - buoyancyWeight)));
      expect(result.regime).toBe('quiet');
    });
  }

  it('classifies by the share of buoyancy: weight 0.1 → surface-tension cells, 0.5 → mixed, 0.9 → buoyancy cells', () => {
    const at = (w: number) => onsetMargin({ ...nieldLayer, rayleigh: refs.nield.rayleigh * w * 2, marangoni: refs.pearson.marangoni * (1 - w) * 2 });
    expect(at(0.1).regime).toBe('surface-tension-cells');
    expect(at(0.5).regime).toBe('mixed-cells');
    expect(at(0.9).regime).toBe('buoyancy-cells');
  });

  it('a stabilising buoyancy (heated from above, Ra < 0) raises the thermocapillary threshold above Pearson (Nield 1964)', () => {
    const result = onsetMargin({ ...nieldLayer, rayleigh: -300, marangoni: 40 });
    expect(result.onsetMarangoni).toBeGreaterThan(refs.pearson.marangoni);
    expect(result.mechanism).toBe('surface-tension-cells');
  });
});

describe('onsetMargin: deformable surface', () => {
  const deformable = (overrides: Partial<StabilityProblem>): StabilityProblem => ({
    ...nieldLayer,
    rayleigh: 0,
    marangoni: 20,
    crispation: 1e-2,
    bond: 0.1,
    ...overrides,
  });

  for (const [biot, crispation, bond] of [
    [0, 1e-2, 0.1],
    [0.5, 1e-2, 0.1],
    [2, 5e-3, 0.02],
    [0.1, 1e-3, 0.3],
  ]) {
    it(`Bi = ${biot}, Cr = ${crispation}, Bo = ${bond}: long-wave margin matches Ma_LW = (2/3)·Ga·(1 + Bi) (VanHook et al. 1997; Davis 1987)`, () => {
      const marangoni = 20;
      const expected = ((2 / 3) * (bond / crispation) * (1 + biot)) / marangoni;
      const result = onsetMargin(deformable({ biot, crispation, bond, marangoni }));
      expect(relative(result.longWaveMargin, expected)).toBeLessThan(1e-5);
    });
  }

  it('a thin, weakly held surface thins by long waves before any cell forms (VanHook et al. 1997)', () => {
    const result = onsetMargin(deformable({ biot: 0.5, marangoni: 20 }));
    // Ma_LW = (2/3)(0.1/0.01)(1.5) = 10 < 20, while Pearson's cellular onset needs Ma ≈ 100 at Bi = 0.5.
    expect(result.longWave).toBe(true);
    expect(result.criticalWavenumber).toBe(0);
    expect(result.regime).toBe('long-wave-thinning');
    expect(result.margin).toBe(result.longWaveMargin);
    expect(result.cellMargin).toBeGreaterThan(result.longWaveMargin);
  });

  it("crispation → 0 returns Pearson's flat-surface onset (Davis 1987; Pearson 1958)", () => {
    const result = onsetMargin(deformable({ biot: 0, crispation: 1e-9, bond: 0.5, marangoni: 40 }));
    expect(result.longWave).toBe(false);
    expect(relative(result.margin, refs.pearson.marangoni / 40)).toBeLessThan(1e-5);
    expect(relative(result.margin, result.cellMargin)).toBeLessThan(1e-6);
  });

  it('without gravity (Bo = 0) any heating from below thins the film: long-wave margin → 0 (Davis 1987: Ma_LW ∝ Ga)', () => {
    const result = onsetMargin(deformable({ bond: 0, marangoni: 5 }));
    expect(result.longWaveMargin).toBeLessThan(1e-9);
    expect(result.regime).toBe('long-wave-thinning');
  });

  // Derived here (documented in marginal-factor-at.ts), not from a paper: the regular expansion W = k²w for a rigid
  // conducting bottom gives λ_LW = (2/3)Ga(1+Bi)/(Ma + (11/60)·Bi·Ra); a free bottom gives Ga(1+Bi)/(Ma + Bi·Ra/3).
  // With Ra = 0 both reduce to the published limits (VanHook et al. 1997 for the rigid bottom).
  for (const [bottom, rayleigh] of [
    ['rigid', 100],
    ['rigid', -40],
    ['free', 100],
    ['free', 30],
  ] as const) {
    it(`with buoyancy (${bottom} bottom, Ra = ${rayleigh}) the long-wave limit shifts as the hand-derived formula says (derived)`, () => {
      const biot = 0.5;
      const crispation = 1e-2;
      const bond = 0.1;
      const marangoni = 10;
      const ga = bond / crispation;
      const expected =
        bottom === 'rigid'
          ? ((2 / 3) * ga * (1 + biot)) / (marangoni + (11 / 60) * biot * rayleigh)
          : (ga * (1 + biot)) / (marangoni + (biot * rayleigh) / 3);
      const result = onsetMargin(deformable({ bottom, biot, crispation, bond, marangoni, rayleigh }));
      expect(relative(result.longWaveMargin, expected)).toBeLessThan(1e-5);
    });
  }

  it('an insulating bottom removes the k → 0 deformational limit (fixed heat flux: no surface-temperature change with depth; Davis 1987)', () => {
    const result = onsetMargin(deformable({ bottomThermal: 'insulating', biot: 0.2, marangoni: 10, crispation: 1e-3 }));
    expect(result.longWaveMargin).toBe(Infinity);
    expect(result.longWave).toBe(false);
  });
});

describe('onsetMargin input checks', () => {
  it.each([
    ['rayleigh', { rayleigh: Number.NaN }],
    ['rayleigh', { rayleigh: Infinity }],
    ['marangoni', { marangoni: -Infinity }],
    ['biot', { biot: Number.NaN }],
    ['crispation', { crispation: Infinity, bond: 1 }],
    ['bond', { crispation: 1e-3, bond: Number.NaN }],
    ['bottomThermal', { bottomThermal: 'adiabatic' }],
  ])('rejects a bad %s with a RangeError naming it', (field, overrides) => {
    expect(() => onsetMargin({ ...nieldLayer, rayleigh: 100, marangoni: 10, ...(overrides as object) } as StabilityProblem)).toThrow(
      new RegExp(field),
    );
  });
});
