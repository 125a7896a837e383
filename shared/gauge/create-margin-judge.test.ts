import { describe, expect, it } from 'vitest';
import { evaluateLayerCheck } from '../fluids/evaluate-layer-check';
import type { LayerFields } from '../fluids/read-layer-input';
import { createMarginJudge } from './create-margin-judge';
import { pearsonFields, primerFluidLaws, roundFluidLaws, snapshotOf } from './gauge-snapshot.fixture';
import { readingFlag } from './reading-flag';

/** Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500: rigid conducting bottom, insulating flat free surface, Ma_c = 79.607. */
const PEARSON_MA_C = 79.607;
const HAND_MA_PER_KELVIN_AT_1_MM = 100; // fixture: Ma = 100·ΔT at 1 mm


/** A drying primer film on a hot plate under oven air, deformable surface, buoyancy included (invented Line 2 numbers). */
const primerFields: LayerFields = {
  ...pearsonFields,
  processKind: 'drying-coat',
  temperature: '40 °C',
  depth: '400 µm',
  deformableSurface: true,
  heating: { mode: 'substrate-air', substrateTemperature: '90 °C', airTemperature: '60 °C', heatTransferCoefficient: '40 W/(m²·K)' },
};

/** Deterministic spread of thicknesses over a range (golden-ratio sequence), log-uniform. */
function thicknessesBetween(min: number, max: number, count: number): number[] {
  return Array.from({ length: count }, (_, i) => Math.exp(Math.log(min) + (Math.log(max) - Math.log(min)) * ((i * 0.618_033_988_75) % 1)));
}

/** The physics core's margin for the same check at another depth (and heating): what the sheet would have said. */
function coreMargin(fields: LayerFields, laws: typeof roundFluidLaws, thickness: number, heating?: LayerFields['heating']): number | null {
  const result = evaluateLayerCheck({ ...fields, depth: `${thickness} m`, heating: heating ?? fields.heating }, laws);
  if (!result.ok) throw new Error(JSON.stringify(result.fields));
  return result.value.margin;
}

describe('createMarginJudge', () => {
  const pearson = createMarginJudge(snapshotOf(pearsonFields, roundFluidLaws));

  it('reproduces Pearson scaling: with ΔT held, Ma ∝ d, so the margin at d is (1 mm / d) (Pearson 1958, Ma_c = 79.607)', () => {
    // The check sits at onset at 1 mm (Ma = 100·ΔT = 79.607, hand calculation in the fixture).
    expect(PEARSON_MA_C / (HAND_MA_PER_KELVIN_AT_1_MM * 0.79607)).toBeCloseTo(1, 9);
    expect(pearson.margin(0.5e-3)).toBeCloseTo(2, 4);
    expect(pearson.margin(1.1e-3)).toBeCloseTo(1 / 1.1, 4);
    expect(pearson.margin(0.25e-3)).toBeCloseTo(4, 4);
  });

  it('gives the largest quiet thickness (margin 1) and the close limit (margin 1.25) of the released check', () => {
    expect(pearson.quietLimits.upper! / 1e-3).toBeCloseTo(1, 4);
    expect(pearson.closeLimits.upper! / 1e-3).toBeCloseTo(1 / 1.25, 4);
    expect(pearson.quietLimits.lower).toBeNull();
  });

  it('flags Quiet at ≥ 1.25, Close between 1 and 1.25, Over below 1 (layer check bands)', () => {
    expect(readingFlag(pearson.margin(0.7e-3), pearson.alertThreshold)).toBe('quiet');
    expect(readingFlag(pearson.margin(0.9e-3), pearson.alertThreshold)).toBe('close');
    expect(readingFlag(pearson.margin(1.05e-3), pearson.alertThreshold)).toBe('over');
    expect(readingFlag(null, 1.25)).toBe('quiet');
  });

  it('interpolates within 1e-4 of direct solves of the physics core (deformable surface, buoyancy, plate and air, across the long-wave kink)', () => {
    const judge = createMarginJudge(snapshotOf(primerFields, primerFluidLaws));
    let worst = 0;
    for (const d of [...thicknessesBetween(judge.thicknessRange[0] * 1.001, judge.thicknessRange[1] * 0.999, 40), ...thicknessesBetween(85e-6, 115e-6, 20)]) {
      const expected = coreMargin(primerFields, primerFluidLaws, d);
      const actual = judge.margin(d);
      expect(actual === null).toBe(expected === null);
      if (expected !== null && actual !== null) worst = Math.max(worst, Math.abs(actual / expected - 1));
    }
    expect(worst).toBeLessThan(1e-4);
  });

  it("judges a reading's plate and air temperatures like the physics core with those temperatures", () => {
    const judge = createMarginJudge(snapshotOf(primerFields, primerFluidLaws));
    expect(judge.temperaturesUsable).toBe(true);
    for (const [tb, ta, d] of [
      [95, 55, 300e-6],
      [80, 70, 500e-6],
      [60, 90, 400e-6],
    ] as const) {
      const heating = { mode: 'substrate-air' as const, substrateTemperature: `${tb} °C`, airTemperature: `${ta} °C`, heatTransferCoefficient: '40 W/(m²·K)' };
      const expected = coreMargin(primerFields, primerFluidLaws, d, heating);
      const actual = judge.margin(d, { substrateTemperature: tb + 273.15, airTemperature: ta + 273.15 });
      if (expected === null) expect(actual).toBeNull();
      else expect(actual! / expected).toBeCloseTo(1, 3);
    }
    // Equal temperatures: no drive, no onset.
    expect(judge.margin(400e-6, { substrateTemperature: 330, airTemperature: 330 })).toBeNull();
  });

  it('cannot use temperatures without a top heat-transfer coefficient and judges at the released heating', () => {
    expect(pearson.temperaturesUsable).toBe(false);
    expect(pearson.margin(0.5e-3, { substrateTemperature: 350, airTemperature: 300 })).toBeCloseTo(2, 4);
  });

  it('solves directly outside its table', () => {
    const before = pearson.solves();
    expect(pearson.margin(20e-3)).toBeCloseTo(1 / 20, 4);
    expect(pearson.solves()).toBe(before + 1);
  });

  it('refuses a thickness that is not positive', () => {
    expect(() => pearson.margin(0)).toThrow(/thickness must be > 0/);
  });
});
