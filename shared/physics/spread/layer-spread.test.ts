import { describe, expect, it } from 'vitest';
import { evaluateLayer } from '../sizing/evaluate-layer';
import type { PhysicalLayer } from '../sizing/types';
import { createLayerSpreadEvaluator } from './create-layer-spread-evaluator';
import { createLayerSpreadPlan } from './create-layer-spread-plan';
import { layerMarginEvaluator } from './layer-margin-evaluator';
import { spreadLayerMargin } from './spread-layer-margin';

// Pearson J. R. A. (1958) J. Fluid Mech. 4:489–500: flat free surface, rigid conducting bottom,
// insulating top (Bi = 0), no buoyancy → onset at Ma_c = 79.607 (our fixture notes; also Nield 1964).
// With Ra = 0 (expansion 0) and a deep 1 mm water-like layer the surface deformation (Cr ~ 1e-6)
// and the long-wave mode (Ma ~ 2G/3 ≫ 80) do not matter, so margin = 79.607/Ma and margin ∝ μ.
const MA_C = 79.607;
const kappa = 0.6 / (1000 * 4180);
const maPerKelvin = (1.5e-4 * 1e-3) / (1e-3 * kappa); // Ma = −σ'ΔT d/(μκ) per kelvin of ΔT
const pearsonLayer: PhysicalLayer = {
  density: 1000,
  viscosity: 1e-3,
  conductivity: 0.6,
  heatCapacity: 4180,
  expansion: 0,
  surfaceTension: 0.07,
  dSigmaDT: -1.5e-4,
  depth: 1e-3,
  deltaT: MA_C / 1.1 / maPerKelvin, // nominal margin 1.1
  heatTransfer: 0,
  gravity: 9.80665,
  bottom: 'rigid',
  bottomThermal: 'conducting',
  top: 'surface',
};

describe('layer margin through the stability solver', () => {
  it('gives Pearson’s margin Ma_c/Ma = 1.1 for the nominal layer, as evaluateLayer does', () => {
    const margin = layerMarginEvaluator(pearsonLayer)({}, 0);
    expect(margin).toBeCloseTo(1.1, 3);
    expect(margin).toBeCloseTo(evaluateLayer(pearsonLayer).margin, 9);
  });

  it('spread over viscosity (±10 % 1σ): P(onset) = Φ((1/1.1 − 1)/0.1) = Φ(−0.9091) = 0.1817', () => {
    // Φ(−0.9091) = 0.18165 (Abramowitz & Stegun 1964, Table 26.1, interpolated).
    const n = 4000;
    const result = spreadLayerMargin(pearsonLayer, [{ name: 'viscosity', relativeUncertainty: 0.1, distribution: 'normal' }], {
      samples: n,
      seed: 1958,
    });
    expect(result.method).toBe('surrogate');
    expect(result.surrogate!.maxRelativeError).toBeLessThan(1e-3);
    const p = 0.181_65;
    expect(Math.abs(result.onsetProbability - p)).toBeLessThan(5 * Math.sqrt((p * (1 - p)) / n));
    // Median margin ≈ 1.1 (margin ∝ μ, symmetric normal factor).
    expect(Math.abs(result.marginPercentiles.p50 - 1.1)).toBeLessThan(5 * 0.11 * 1.2533 * Math.sqrt(1 / n) + 2e-3);
  });

  it('ranks viscosity above dσ/dT above density, with the signs Ma = −σ′ΔTd/(μκ) implies (Pearson 1958)', () => {
    const result = spreadLayerMargin(
      pearsonLayer,
      [
        { name: 'density', relativeUncertainty: 0.01, distribution: 'normal' },
        { name: 'dSigmaDT', relativeUncertainty: 0.05, distribution: 'normal' },
        { name: 'viscosity', relativeUncertainty: 0.1, distribution: 'normal' },
      ],
      { samples: 3000, seed: 4 },
    );
    expect(result.sensitivity.map((s) => s.name)).toEqual(['viscosity', 'dSigmaDT', 'density']);
    const dir = Object.fromEntries(result.sensitivity.map((s) => [s.name, s.direction]));
    expect(dir).toEqual({ viscosity: 'raises', dSigmaDT: 'lowers', density: 'lowers' });
    expect(result.swing[0].name).toBe('viscosity');
    expect(result.swing[0].marginHigh / result.swing[0].marginLow).toBeCloseTo(1.1 / 0.9, 3);
  });

  it('surrogate and full solver give the same percentiles within the surrogate’s validated error', () => {
    const props = [
      { name: 'viscosity', relativeUncertainty: 0.1, distribution: 'normal' as const },
      { name: 'depth', relativeUncertainty: 0.03, distribution: 'uniform' as const },
    ];
    const options = { samples: 60, seed: 12 };
    const fast = spreadLayerMargin(pearsonLayer, props, options);
    const full = spreadLayerMargin(pearsonLayer, props, { ...options, method: 'solver' });
    expect(full.method).toBe('solver');
    const tol = Math.max(fast.surrogate!.maxRelativeError * 3, 1e-6);
    expect(Math.abs(fast.marginPercentiles.p50 / full.marginPercentiles.p50 - 1)).toBeLessThan(tol);
    expect(Math.abs(fast.marginPercentiles.p5 / full.marginPercentiles.p5 - 1)).toBeLessThan(tol);
  });

  it('rejects an uncertainty on a field the layer does not have', () => {
    expect(() =>
      createLayerSpreadPlan(pearsonLayer, [{ name: 'colour', relativeUncertainty: 0.1, distribution: 'normal' }], {
        samples: 10,
        seed: 1,
      }),
    ).toThrow(/uncertainties\[0\].name must be one of density, viscosity/);
    expect(() =>
      createLayerSpreadEvaluator(pearsonLayer, [], { seed: 1, surrogateTolerance: 2 }),
    ).toThrow(/surrogateTolerance/);
  });

  it('the same seed gives the same layer spread', () => {
    const props = [{ name: 'viscosity', relativeUncertainty: 0.05, distribution: 'uniform' as const }];
    const a = spreadLayerMargin(pearsonLayer, props, { samples: 500, seed: 3 });
    const b = spreadLayerMargin(pearsonLayer, props, { samples: 500, seed: 3 });
    expect(b).toEqual(a);
  });
});
