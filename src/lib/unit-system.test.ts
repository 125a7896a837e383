/**
 * Display units per person. Expected strings use exact conversion factors from Thompson A., Taylor
 * B.N. (2008) NIST Special Publication 811, Appendix B.8/B.9: 1 mil = 25.4 µm; 1 cP = 1 mPa·s;
 * 1 dyn/cm = 1 mN/m; T(°F) = 1.8·t(°C) + 32; a difference of 1 K = 1.8 °F;
 * 1 Btu_IT/(h·ft²·°F) = 5.678 263 W/(m²·K); 1 ft/min = 0.005 08 m/s.
 */
import { describe, expect, it } from 'vitest';
import { formatInSystem, formatLengthForScale, formatNumber, withPowerOfTen } from './unit-system';

describe('formatInSystem', () => {
  it('shows a wet thickness in µm on the coating floor and in mil in US units', () => {
    expect(formatInSystem(50.8e-6, 'length', 'floor')).toBe('50.80 µm');
    expect(formatInSystem(50.8e-6, 'length', 'us')).toBe('2.000 mil');
    expect(formatInSystem(50.8e-6, 'length', 'si')).toBe('0.00005080 m');
  });

  it('shows viscosity and surface tension in the trade units of each system', () => {
    expect(formatInSystem(0.012, 'dynamicViscosity', 'floor')).toBe('12.00 mPa·s');
    expect(formatInSystem(0.012, 'dynamicViscosity', 'us')).toBe('12.00 cP');
    expect(formatInSystem(0.035, 'surfaceTension', 'us')).toBe('35.00 dyn/cm');
    expect(formatInSystem(0.035, 'surfaceTension', 'floor')).toBe('35.00 mN/m');
  });

  it('keeps an absolute temperature and a temperature difference apart', () => {
    expect(formatInSystem(293.15, 'temperature', 'us')).toBe('68.00 °F');
    expect(formatInSystem(293.15, 'temperature', 'floor')).toBe('20.00 °C');
    expect(formatInSystem(5, 'temperatureDifference', 'us')).toBe('9.000 °F');
    expect(formatInSystem(5, 'temperatureDifference', 'floor')).toBe('5.000 K');
  });

  it('converts a heat-transfer coefficient and a speed to US units', () => {
    expect(formatInSystem(5.678263, 'heatTransferCoefficient', 'us')).toBe('1.000 Btu/(h·ft²·°F)');
    expect(formatInSystem(0.00508, 'speed', 'us')).toBe('1.000 ft/min');
  });

  it('writes very small values with a power of ten and says "—" for no value', () => {
    expect(formatInSystem(1e-9, 'diffusivity', 'si')).toBe('1.000 × 10⁻⁹ m²/s');
    expect(formatInSystem(null, 'length', 'si')).toBe('—');
    expect(formatInSystem(Number.POSITIVE_INFINITY, 'length', 'si')).toBe('—');
  });
});

describe('formatNumber', () => {
  it('gives 4 significant digits and a power of ten outside 0.001 … 999,999', () => {
    expect(formatNumber(79.607)).toBe('79.61');
    // Digits grouped in threes only past four digits (NIST SP 811 §10.5.3).
    expect(formatNumber(1707.76)).toBe('1708');
    expect(formatNumber(12_345.6)).toBe('12,350');
    expect(formatNumber(2.4e-5)).toBe('2.400 × 10⁻⁵');
    expect(formatNumber(3.2e7)).toBe('3.200 × 10⁷');
    expect(formatNumber(null)).toBe('—');
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe('∞');
  });

  it('rewrites an exponent only where a digit precedes it', () => {
    expect(withPowerOfTen('1.5e-3 m')).toBe('1.5 × 10⁻³ m');
    expect(withPowerOfTen('degree')).toBe('degree');
  });
});

describe('formatLengthForScale', () => {
  it('picks µm, mm or m on the coating floor and mil or in in US units (1 in = 25.4 mm, NIST SP 811)', () => {
    expect(formatLengthForScale(200e-6, 'floor')).toBe('200 µm');
    expect(formatLengthForScale(0.01, 'floor')).toBe('10.0 mm');
    expect(formatLengthForScale(1.2, 'floor')).toBe('1.20 m');
    expect(formatLengthForScale(0.0254, 'us')).toBe('1.00 in');
    expect(formatLengthForScale(254e-6, 'us')).toBe('10.0 mil');
  });
});
