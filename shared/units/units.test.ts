import { describe, expect, it } from 'vitest';
import { CELSIUS_ZERO_KELVIN, MOLAR_GAS_CONSTANT, STANDARD_GRAVITY } from './constants';
import { convertQuantity } from './convert';
import { formatQuantity } from './format-quantity';
import { formatSignificant } from './format-significant';
import { parseQuantity } from './parse-quantity';
import { UnitError } from './unit-error';

// Conversion factors: Thompson A., Taylor B. N. (2008) "Guide for the Use of the International System of
// Units (SI)", NIST Special Publication 811, Appendix B (exact factors marked there as exact).
describe('parseQuantity: lengths (NIST SP 811 App. B: 1 in = 0.0254 m exactly)', () => {
  it('reads 1 mil as 25.4 µm exactly (1 mil = 0.001 in)', () => {
    expect(parseQuantity('1 mil', 'length')).toBeCloseTo(25.4e-6, 15);
    expect(convertQuantity(1, 'mil', 'µm', 'length')).toBeCloseTo(25.4, 10);
  });
  it('accepts µ (micro sign), μ (Greek mu) and u for micro', () => {
    expect(parseQuantity('50 µm', 'length')).toBeCloseTo(50e-6, 15);
    expect(parseQuantity('50 μm', 'length')).toBeCloseTo(50e-6, 15);
    expect(parseQuantity('50um', 'length')).toBeCloseTo(50e-6, 15);
    expect(parseQuantity('2 in', 'length')).toBeCloseTo(0.0508, 12);
    expect(parseQuantity('1.5 mm', 'length')).toBeCloseTo(0.0015, 15);
  });
});

describe('parseQuantity: viscosity (NIST SP 811 App. B.8: 1 P = 0.1 Pa·s, 1 St = 1e-4 m²/s)', () => {
  it('reads 1 cP as 1 mPa·s', () => {
    expect(parseQuantity('1 cP', 'dynamicViscosity')).toBeCloseTo(1e-3, 15);
    expect(parseQuantity('1 mPa·s', 'dynamicViscosity')).toBeCloseTo(1e-3, 15);
    expect(parseQuantity('1 mPa s', 'dynamicViscosity')).toBeCloseTo(1e-3, 15);
    expect(parseQuantity('2 P', 'dynamicViscosity')).toBeCloseTo(0.2, 15);
    expect(parseQuantity('0.9 Pa.s', 'dynamicViscosity')).toBeCloseTo(0.9, 15);
  });
  it('reads cSt and St as kinematic viscosity', () => {
    expect(parseQuantity('10 cSt', 'kinematicViscosity')).toBeCloseTo(1e-5, 15);
    expect(parseQuantity('1 St', 'kinematicViscosity')).toBeCloseTo(1e-4, 15);
    expect(parseQuantity('1e-6 m²/s', 'kinematicViscosity')).toBeCloseTo(1e-6, 18);
  });
});

describe('parseQuantity: surface tension (NIST SP 811 App. B: 1 dyn = 1e-5 N)', () => {
  it('reads 35 dyn/cm as 0.035 N/m', () => {
    expect(parseQuantity('35 dyn/cm', 'surfaceTension')).toBeCloseTo(0.035, 14);
    expect(parseQuantity('72.74 mN/m', 'surfaceTension')).toBeCloseTo(0.07274, 14);
  });
  it('reads a slope in mN/(m·K)', () => {
    expect(parseQuantity('-0.1 mN/(m·K)', 'surfaceTensionSlope')).toBeCloseTo(-1e-4, 15);
    expect(parseQuantity('−0.155 mN/(m K)', 'surfaceTensionSlope')).toBeCloseTo(-1.55e-4, 15);
  });
});

describe('parseQuantity: temperatures (BIPM SI Brochure 2019 §2.3.1; NIST SP 811 §B.8)', () => {
  it('reads 68 °F as 293.15 K (absolute)', () => {
    expect(parseQuantity('68 °F', 'temperature')).toBeCloseTo(293.15, 10);
    expect(parseQuantity('68 degF', 'temperature')).toBeCloseTo(293.15, 10);
    expect(parseQuantity('20 °C', 'temperature')).toBeCloseTo(293.15, 10);
    expect(parseQuantity('20 C', 'temperature')).toBeCloseTo(293.15, 10);
    expect(parseQuantity('300 K', 'temperature')).toBe(300);
  });
  it('reads a 9 °F difference as 5 K, with no offset', () => {
    expect(parseQuantity('9 °F', 'temperatureDifference')).toBeCloseTo(5, 12);
    expect(parseQuantity('10 °C', 'temperatureDifference')).toBeCloseTo(10, 12);
    expect(parseQuantity('10 K', 'temperatureDifference')).toBe(10);
  });
  it('formats a difference and an absolute temperature differently', () => {
    expect(formatQuantity(5, 'temperatureDifference', '°F')).toBe('9.000 °F');
    expect(formatQuantity(293.15, 'temperature', '°F')).toBe('68.00 °F');
  });
  it('refuses temperatures at or below absolute zero', () => {
    expect(() => parseQuantity('-300 °C', 'temperature')).toThrow(/absolute zero/);
  });
});

describe('parseQuantity: heat, density, fluxes and speeds', () => {
  it('reads 1 Btu/(h·ft²·°F) as about 5.678 W/(m²·K) (NIST SP 811 App. B: Btu_IT = 1055.05585262 J)', () => {
    // 1055.05585262 J / 3600 s / 0.09290304 m² / (5/9 K) = 5.678263 W/(m²·K)
    expect(parseQuantity('1 Btu/(h·ft²·°F)', 'heatTransferCoefficient')).toBeCloseTo(5.678263, 5);
  });
  it('reads conductivity, heat capacity, density and expansion', () => {
    expect(parseQuantity('0.15 W/(m·K)', 'conductivity')).toBeCloseTo(0.15, 15);
    expect(parseQuantity('2.1 kJ/(kg·K)', 'heatCapacity')).toBeCloseTo(2100, 10);
    expect(parseQuantity('1.2 g/cm³', 'density')).toBeCloseTo(1200, 9);
    expect(parseQuantity('1.2 g/cm3', 'density')).toBeCloseTo(1200, 9);
    expect(parseQuantity('25 W/(m2·K)', 'heatTransferCoefficient')).toBeCloseTo(25, 12);
    expect(parseQuantity('2e-4 1/K', 'expansion')).toBeCloseTo(2e-4, 15);
    expect(parseQuantity('2e-4 /K', 'expansion')).toBeCloseTo(2e-4, 15);
    expect(parseQuantity('2e-4 K⁻¹', 'expansion')).toBeCloseTo(2e-4, 15);
    // per °F of difference: 1/°F = 1.8/K (NIST SP 811 §B.8)
    expect(parseQuantity('1e-4 1/°F', 'expansion')).toBeCloseTo(1.8e-4, 15);
  });
  it('reads heat flux, mass flux, diffusivity and latent heat', () => {
    expect(parseQuantity('1 kW/m²', 'heatFlux')).toBeCloseTo(1000, 10);
    expect(parseQuantity('2 g/(m²·s)', 'massFlux')).toBeCloseTo(0.002, 15);
    expect(parseQuantity('1e-9 m²/s', 'diffusivity')).toBeCloseTo(1e-9, 20);
    expect(parseQuantity('2257 kJ/kg', 'latentHeat')).toBeCloseTo(2_257_000, 6);
  });
  it('reads speeds: 1 ft/min = 0.00508 m/s exactly (1 ft = 0.3048 m)', () => {
    expect(parseQuantity('1 ft/min', 'speed')).toBeCloseTo(0.00508, 15);
    expect(parseQuantity('91 m/min', 'speed')).toBeCloseTo(91 / 60, 12);
  });
  it('uses the default unit for a bare number', () => {
    expect(parseQuantity('50', 'length', { defaultUnit: 'µm' })).toBeCloseTo(50e-6, 15);
  });
});

describe('parseQuantity: errors name the quantity and what was expected', () => {
  it('refuses a length unit for a viscosity', () => {
    expect(() => parseQuantity('3 mm', 'dynamicViscosity')).toThrow(UnitError);
    expect(() => parseQuantity('3 mm', 'dynamicViscosity')).toThrow(/dynamic viscosity.*mPa·s/);
  });
  it('refuses an unknown unit', () => {
    expect(() => parseQuantity('3 furlongs per', 'length')).toThrow(/length: unknown unit/);
  });
  it('refuses a bare number without a default unit and text with no number', () => {
    expect(() => parseQuantity('3', 'length')).toThrow(/has no unit/);
    expect(() => parseQuantity('mm', 'length')).toThrow(/no number/);
  });
  it('refuses an overflowing number', () => {
    expect(() => parseQuantity('1e999 m', 'length')).toThrow(/finite/);
  });
});

describe('formatQuantity and formatSignificant', () => {
  it('formats with 4 significant digits by default', () => {
    expect(formatQuantity(0.035, 'surfaceTension', 'mN/m')).toBe('35.00 mN/m');
    expect(formatQuantity(25.4e-6, 'length', 'µm')).toBe('25.40 µm');
    expect(formatQuantity(1e-3, 'dynamicViscosity', 'cP', 3)).toBe('1.00 cP');
  });
  it('switches to exponent form for very large and very small magnitudes', () => {
    expect(formatSignificant(1.2345e12, 3)).toBe('1.23e+12');
    expect(formatSignificant(1.2345e-7, 3)).toBe('1.23e-7');
    expect(formatSignificant(123456, 4)).toBe('123500');
  });
});

describe('constants', () => {
  it('holds the exact defined values', () => {
    expect(STANDARD_GRAVITY).toBe(9.80665); // 3rd CGPM 1901
    expect(CELSIUS_ZERO_KELVIN).toBe(273.15); // SI Brochure 2019 §2.3.1
    expect(MOLAR_GAS_CONSTANT).toBe(8.31446261815324); // CODATA 2018, exact
  });
});

describe('parse and format round trip (property-based)', () => {
  it('property: formatting an SI value in any listed unit and reading it back returns the value', async () => {
    const fc = (await import('fast-check')).default;
    const { quantityKinds } = await import('./quantity-kinds');
    const kinds = Object.keys(quantityKinds) as (keyof typeof quantityKinds)[];
    fc.assert(
      fc.property(fc.constantFrom(...kinds), fc.double({ min: 1e-3, max: 1e3, noNaN: true }), fc.nat(), (kind, scale, pick) => {
        const units = quantityKinds[kind].units;
        const unit = units[pick % units.length];
        const si = kind === 'temperature' ? 200 + scale : scale * 1e-3;
        const text = formatQuantity(si, kind, unit, 15);
        expect(Math.abs(parseQuantity(text, kind) / si - 1)).toBeLessThan(1e-12);
      }),
      { numRuns: 300 },
    );
  });
});

describe('resolveUnit memo: the same answer every time, and errors never kept', () => {
  it('1 cP = 1e-3 Pa·s on the first and the second reading (NIST SP 811 App. B.8), and a wrong unit throws each time', async () => {
    const { resolveUnit } = await import('./resolve-unit');
    const first = resolveUnit('cP', 'dynamicViscosity');
    const second = resolveUnit('cP', 'dynamicViscosity');
    expect(second).toBe(first);
    expect(second.unit.toNumber('Pa s')).toBeCloseTo(1e-3, 15);
    expect(parseQuantity('12 cP', 'dynamicViscosity')).toBeCloseTo(0.012, 15);
    for (let i = 0; i < 2; i++) expect(() => resolveUnit('mN/m', 'dynamicViscosity')).toThrow(UnitError);
    // The same text is a different question for another kind.
    expect(() => resolveUnit('cP', 'surfaceTension')).toThrow(UnitError);
  });
});
