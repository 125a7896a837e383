import { describe, expect, it } from 'vitest';
import { classifyRegime } from './classify-regime';
import { regimeLabels } from './regime-labels';

describe('classifyRegime (QuietLayer rule: quiet at margin ≥ 1; shares 0.2/0.8 split the cellular regimes)', () => {
  it('is quiet at and above a margin of 1, whatever the mechanism', () => {
    expect(classifyRegime({ margin: 1, buoyancyShare: 0.5, longWave: false })).toBe('quiet');
    expect(classifyRegime({ margin: 3, buoyancyShare: 0, longWave: true })).toBe('quiet');
    expect(classifyRegime({ margin: Infinity, buoyancyShare: Number.NaN, longWave: false })).toBe('quiet');
  });
  it('names long-wave thinning before the cell regimes', () => {
    expect(classifyRegime({ margin: 0.5, buoyancyShare: 0.9, longWave: true })).toBe('long-wave-thinning');
  });
  it('splits cells by buoyancy share', () => {
    expect(classifyRegime({ margin: 0.5, buoyancyShare: 0.05, longWave: false })).toBe('surface-tension-cells');
    expect(classifyRegime({ margin: 0.5, buoyancyShare: 0.2, longWave: false })).toBe('surface-tension-cells');
    expect(classifyRegime({ margin: 0.5, buoyancyShare: 0.5, longWave: false })).toBe('mixed-cells');
    expect(classifyRegime({ margin: 0.5, buoyancyShare: 0.8, longWave: false })).toBe('buoyancy-cells');
  });
  it('rejects a NaN margin and an out-of-range share', () => {
    expect(() => classifyRegime({ margin: Number.NaN, buoyancyShare: 0.5, longWave: false })).toThrow(/margin/);
    expect(() => classifyRegime({ margin: 0.5, buoyancyShare: 1.5, longWave: false })).toThrow(/buoyancyShare/);
  });
  it('has a label in QuietLayer wording for every regime', () => {
    expect(Object.values(regimeLabels)).toEqual(['Quiet', 'Surface-tension cells', 'Buoyancy cells', 'Mixed cells', 'Long-wave thinning']);
  });
});
