import { describe, expect, it } from 'vitest';
import { pearsonFields, roundFluidLaws } from '../gauge/gauge-snapshot.fixture';
import { evaluateLayerCheck } from './evaluate-layer-check';
import { mechanismSentence } from './mechanism-sentence';

/** Pearson (1958) thresholds of a rigid conducting bottom under an insulating flat surface: Ra_c 669.0, Ma_c 79.607 (Nield 1964, Table 1). */
const thresholds = { rayleighCritical: 669.0, marangoniCritical: 79.607 };

describe('mechanismSentence', () => {
  it('names surface tension when buoyancy is negligible and cells win (r = Bo_d·Ma_c/Ra_c < 0.1; Nield 1964)', () => {
    const sentence = mechanismSentence({ depth: 5e-5, hasSurface: true, dynamicBond: 2e-4, ...thresholds });
    expect(sentence).toBe('At 50.0 µm buoyancy is negligible; surface tension drives the cells.');
  });

  it('names long-wave thinning, not cells, when the long-wave mode of a deformable surface is the most dangerous (VanHook et al. 1997, J. Fluid Mech. 345:45–78)', () => {
    const sentence = mechanismSentence({ depth: 5e-5, hasSurface: true, longWave: true, dynamicBond: 2e-4, ...thresholds });
    expect(sentence).toMatch(/^At 50\.0 µm /);
    expect(sentence).toMatch(/long-wave thinning/);
    expect(sentence).toMatch(/thins/);
    expect(sentence).toMatch(/gravity/);
    expect(sentence).not.toMatch(/drives the cells/);
  });

  it('keeps "no free surface" wording for a closed top whatever the long-wave flag (only buoyancy can act; Nield 1964)', () => {
    expect(mechanismSentence({ depth: 1e-3, hasSurface: false, longWave: true, dynamicBond: null, rayleighCritical: 1707.8, marangoniCritical: null })).toMatch(
      /no free surface, so only buoyancy/,
    );
  });
});

describe('layer check evaluation: mechanism sentence', () => {
  // Round fluid at 30 µm, ΔT 1 K: Ma = 3 against Pearson's cellular 79.6 (Pearson 1958), but the
  // long-wave threshold of a deformable insulating surface is Ma = (2/3)·G, G = g·d³/(ν·κ) ≈ 0.26
  // (VanHook et al. 1997, eq. for Bi = 0), far lower: the film thins before any cell forms.
  const thinFilm = { ...pearsonFields, depth: '30 µm', heating: { mode: 'deltaT' as const, deltaT: '1 K' } };

  it('says long-wave thinning when that mode is the most dangerous on a deformable surface', () => {
    const result = evaluateLayerCheck({ ...thinFilm, deformableSurface: true }, roundFluidLaws);
    if (!result.ok) throw new Error(JSON.stringify(result.fields));
    expect(result.value.mechanism).toBe('long-wave-thinning');
    expect(result.value.mechanismSentence).toMatch(/long-wave thinning/);
    expect(result.value.mechanismSentence).not.toMatch(/drives the cells/);
  });

  it('says surface tension drives the cells for the same film with a flat surface (no long-wave mode)', () => {
    const result = evaluateLayerCheck({ ...thinFilm, deformableSurface: false }, roundFluidLaws);
    if (!result.ok) throw new Error(JSON.stringify(result.fields));
    expect(result.value.mechanism).toBe('surface-tension-cells');
    expect(result.value.mechanismSentence).toBe('At 30.0 µm buoyancy is negligible; surface tension drives the cells.');
  });
});
