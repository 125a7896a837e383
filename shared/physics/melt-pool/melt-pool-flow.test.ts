import { describe, expect, it } from 'vitest';
import { assessMeltPoolFlow } from './assess-melt-pool-flow';
import { compareJoinedPartSulfur } from './compare-joined-part-sulfur';
import { LARKSPUR_WELD_CELL_DEMO } from './larkspur-weld-cell-demo';
import { marangoniSurfaceVelocity } from './marangoni-surface-velocity';
import { meltPoolMarangoniNumber } from './melt-pool-marangoni-number';
import { meltPoolPecletNumber } from './melt-pool-peclet-number';
import { surfaceFlowDirection } from './surface-flow-direction';
import { WELDING_CAUTIONS } from './welding-cautions';

// Sources and hand calculations: tests/fixtures/melt-pool-sources.md.
// Scale inputs (|dγ/dT| 0.4 mN/(m·K), ΔT 1000 K, L 3 mm, ρ 7000 kg/m³, μ 6 mPa·s, κ 5×10⁻⁶ m²/s)
// are typical liquid-steel figures from memory — verify; the formulas are DebRoy & David (1995).
const scaleCase = { surfaceTensionSlope: -4e-4, temperatureDifference: 1000, length: 3e-3 };

describe('surfaceFlowDirection (Heiple & Roper 1982; Mills et al. 1998)', () => {
  it('low sulfur: outward flow and a shallow, wide pool', () => {
    const flow = surfaceFlowDirection({ activity: 0.002, edgeTemperature: 1809, peakTemperature: 2400 });
    expect(flow.direction).toBe('outward');
    expect(flow.poolShape).toBe('shallow-wide');
    expect(flow.signChangeTemperature).toBeNull();
  });

  it('high sulfur in a cool pool: inward flow and a deeper, narrower pool', () => {
    const flow = surfaceFlowDirection({ activity: 0.03, edgeTemperature: 1809, peakTemperature: 2000 });
    expect(flow.direction).toBe('inward');
    expect(flow.poolShape).toBe('deep-narrow');
  });

  it('sign change inside the pool: mixed flow, outward in the hot centre and inward at the rim', () => {
    const flow = surfaceFlowDirection({ activity: 0.01, edgeTemperature: 1809, peakTemperature: 2400 });
    expect(flow.direction).toBe('mixed');
    expect(flow.poolShape).toBe('intermediate');
    expect(flow.slopeAtEdge).toBeGreaterThan(0);
    expect(flow.slopeAtPeak).toBeLessThan(0);
    expect(flow.signChangeTemperature).toBeGreaterThan(1809);
    expect(flow.signChangeTemperature).toBeLessThan(2400);
    expect(flow.description).toMatch(/outward where it is hotter .* inward where it is cooler/);
  });

  it('rejects a peak temperature not above the edge temperature', () => {
    expect(() => surfaceFlowDirection({ activity: 0.01, edgeTemperature: 1900, peakTemperature: 1900 })).toThrow(
      /peakTemperature must be above edgeTemperature/,
    );
  });
});

describe('melt-pool scales (DebRoy & David 1995)', () => {
  it('Ma = |dγ/dT|ΔT L/(μκ) = 4×10⁴ for the hand-calculated case', () => {
    const ma = meltPoolMarangoniNumber({ ...scaleCase, viscosity: 6e-3, thermalDiffusivity: 5e-6 });
    expect(ma).toBeCloseTo(40_000, 6);
  });

  it('τ = 133.3 Pa and u = (τ²L/(ρμ))^⅓ = 1.0829 m/s for the hand-calculated case', () => {
    const scale = marangoniSurfaceVelocity({ ...scaleCase, density: 7000, viscosity: 6e-3 });
    expect(scale.surfaceStress).toBeCloseTo(133.3333, 3);
    expect(scale.velocity).toBeCloseTo(1.082887, 5);
  });

  it('balances surface stress against viscous shear across the boundary layer, τ = μu/δ', () => {
    const scale = marangoniSurfaceVelocity({ ...scaleCase, density: 7000, viscosity: 6e-3 });
    expect((6e-3 * scale.velocity) / scale.boundaryLayerThickness).toBeCloseTo(scale.surfaceStress, 8);
  });

  it('scales as ΔT^(2/3): doubling ΔT raises u by 2^(2/3) = 1.5874', () => {
    const base = marangoniSurfaceVelocity({ ...scaleCase, density: 7000, viscosity: 6e-3 });
    const doubled = marangoniSurfaceVelocity({ ...scaleCase, temperatureDifference: 2000, density: 7000, viscosity: 6e-3 });
    expect(doubled.velocity / base.velocity).toBeCloseTo(1.587401, 6);
  });

  it('Pe = uL/κ = 600 for u = 1 m/s, L = 3 mm, κ = 5×10⁻⁶ m²/s', () => {
    expect(meltPoolPecletNumber(1, 3e-3, 5e-6)).toBeCloseTo(600, 9);
  });

  it('rejects a zero length or viscosity, naming the field', () => {
    expect(() => meltPoolPecletNumber(1, 0, 5e-6)).toThrow(/length must be > 0/);
    expect(() => marangoniSurfaceVelocity({ ...scaleCase, density: 7000, viscosity: 0 })).toThrow(/viscosity must be > 0/);
  });
});

describe('assessMeltPoolFlow', () => {
  it('combines the model: low sulfur flows outward, Pe ≫ 1 so the flow shapes the pool', () => {
    const { check } = LARKSPUR_WELD_CELL_DEMO;
    const result = assessMeltPoolFlow({ ...check, sulfurPpm: 20 });
    expect(result.flow.direction).toBe('outward');
    expect(result.pecletNumber).toBeGreaterThan(100);
    expect(result.flowShapesPool).toBe(true);
    expect(result.surfaceTensionAtPeak).toBeLessThan(result.surfaceTensionAtEdge);
    expect(result.rangeWarnings).toEqual([]);
  });

  it('flags inputs outside the fitted range', () => {
    const { check } = LARKSPUR_WELD_CELL_DEMO;
    const result = assessMeltPoolFlow({ ...check, edgeTemperature: 1700, peakTemperature: 3300, sulfurPpm: 2000 });
    expect(result.rangeWarnings).toHaveLength(3);
  });
});

describe('compareJoinedPartSulfur', () => {
  it('warns for the Larkspur demo heats (20 and 120 ppm S): opposite flows and opposite sides of the band', () => {
    const [a, b] = LARKSPUR_WELD_CELL_DEMO.heats;
    const result = compareJoinedPartSulfur({
      first: { label: a.heatNumber, sulfurPpm: a.sulfurWtPercent * 1e4, oxygenPpm: a.oxygenWtPercent * 1e4 },
      second: { label: b.heatNumber, sulfurPpm: b.sulfurWtPercent * 1e4, oxygenPpm: b.oxygenWtPercent * 1e4 },
      poolTemperature: 1850,
    });
    expect(result.warnings.map((w) => w.code)).toEqual(['flow-direction-differs', 'straddles-sulfur-band']);
    expect(result.parts[0].flowDirection).toBe('outward');
    expect(result.parts[1].flowDirection).toBe('inward');
    expect(result.sulfurDifferencePpm).toBeCloseTo(100, 9);
    expect(result.warnings[0].message).toContain('LK-H24-0173');
  });

  it('gives no warning for two low-sulfur heats', () => {
    const result = compareJoinedPartSulfur({
      first: { label: 'H1', sulfurPpm: 10 },
      second: { label: 'H2', sulfurPpm: 25 },
      poolTemperature: 1850,
    });
    expect(result.warnings).toEqual([]);
    expect(result.notes.join(' ')).toMatch(/oxygen/i);
  });

  it('marks a heat inside the 30–70 ppm band as uncertain', () => {
    const result = compareJoinedPartSulfur({
      first: { label: 'H1', sulfurPpm: 15 },
      second: { label: 'H2', sulfurPpm: 50 },
      poolTemperature: 1850,
    });
    expect(result.warnings.map((w) => w.code)).toContain('inside-sulfur-band');
    expect(result.warnings.map((w) => w.code)).not.toContain('straddles-sulfur-band');
  });

  it('rejects a missing label or impossible sulfur, naming the field', () => {
    expect(() =>
      compareJoinedPartSulfur({ first: { label: '', sulfurPpm: 10 }, second: { label: 'B', sulfurPpm: 10 }, poolTemperature: 1850 }),
    ).toThrow(/first.label/);
    expect(() =>
      compareJoinedPartSulfur({ first: { label: 'A', sulfurPpm: 10 }, second: { label: 'B', sulfurPpm: -3 }, poolTemperature: 1850 }),
    ).toThrow(/second.sulfurPpm must be from 0 to 10000 ppm/);
  });
});

describe('WELDING_CAUTIONS', () => {
  it('covers fume with hexavalent chromium, arc and laser radiation, burns, fire and qualified procedures', () => {
    const text = WELDING_CAUTIONS.map((c) => `${c.title} ${c.text} ${c.basis}`).join(' ');
    expect(text).toMatch(/hexavalent chromium/);
    expect(text).toMatch(/ultraviolet/);
    expect(text).toMatch(/laser/i);
    expect(text).toMatch(/burn/i);
    expect(text).toMatch(/fire/i);
    expect(text).toMatch(/ASME Section IX/);
    expect(text).toMatch(/local codes/);
    expect(new Set(WELDING_CAUTIONS.map((c) => c.id)).size).toBe(WELDING_CAUTIONS.length);
    expect(Object.isFrozen(WELDING_CAUTIONS[0])).toBe(true);
  });
});
