import { describe, expect, it } from 'vitest';
import { massContentSchema } from './melt-pool';
import { fractionSchema, molarMassSchema } from './drying-paths';

describe('unit-aware contents and fractions', () => {
  it('reads sulfur in wt % or ppm by mass (1 ppm = 10⁻⁴ wt %, by definition)', () => {
    const sulfur = massContentSchema('sulfur');
    expect(sulfur.parse('0.012 wt %')).toBeCloseTo(0.012, 15);
    expect(sulfur.parse('120 ppm')).toBeCloseTo(0.012, 15);
    expect(sulfur.parse('0.012 %')).toBeCloseTo(0.012, 15);
    expect(sulfur.parse(0.002)).toBe(0.002);
    expect(sulfur.safeParse('12 g').success).toBe(false);
    expect(sulfur.safeParse('2 wt %').success).toBe(false); // above 1 wt %: not a trace element
  });

  it('reads fractions as 0…1 or percent, and molar mass in g/mol or kg/mol', () => {
    const solids = fractionSchema('solidsFraction');
    expect(solids.parse('35 %')).toBeCloseTo(0.35, 15);
    expect(solids.parse(0.35)).toBe(0.35);
    expect(solids.parse('1.1 vol %')).toBeCloseTo(0.011, 15);
    expect(solids.safeParse('135 %').success).toBe(false);
    // Toluene C₇H₈: 92.141 g/mol from IUPAC standard atomic weights.
    expect(molarMassSchema.parse('92.141 g/mol')).toBeCloseTo(0.092141, 12);
    expect(molarMassSchema.parse('0.092141 kg/mol')).toBeCloseTo(0.092141, 12);
    expect(molarMassSchema.safeParse('92 g').success).toBe(false);
  });
});
