import { describe, expect, it } from 'vitest';
import { solventLoadRate } from './solvent-load-rate';
import { solventVentilationCaution } from './solvent-ventilation-caution';
import { zoneResidenceTime } from './zone-residence-time';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('zoneResidenceTime', () => {
  it('6.1 m at 91 m/min → 4.0 s (derived from stated inputs: 6.1 / (91/60) = 4.022 s)', () => {
    expect(Number(zoneResidenceTime(6.1, 91 / 60).toFixed(1))).toBe(4.0);
    expect(rel(zoneResidenceTime(6.1, 91 / 60), 366 / 91)).toBeLessThan(1e-12);
  });

  it('rejects a stopped line', () => {
    expect(() => zoneResidenceTime(6.1, 0)).toThrow(/lineSpeed must be > 0/);
  });
});

describe('solventLoadRate', () => {
  it('50 µm wet, VS 40 %, 1.5 m wide, 100 m/min → 4.5 L/min (derived from stated inputs)', () => {
    // 50e-6 m × 0.6 × 1.5 m × (100/60) m/s = 7.5e-5 m³/s = 4.5 L/min.
    const rate = solventLoadRate({ wetThickness: 50e-6, volumeSolids: 0.4, webWidth: 1.5, lineSpeed: 100 / 60 });
    expect(rel(rate * 60_000, 4.5)).toBeLessThan(1e-12);
  });

  it('rises with a thicker film, a faster line and lower solids (the §11 caution’s levers)', () => {
    const base = { wetThickness: 50e-6, volumeSolids: 0.4, webWidth: 1.5, lineSpeed: 1 };
    const q = solventLoadRate(base);
    expect(solventLoadRate({ ...base, wetThickness: 60e-6 })).toBeGreaterThan(q);
    expect(solventLoadRate({ ...base, lineSpeed: 1.2 })).toBeGreaterThan(q);
    expect(solventLoadRate({ ...base, volumeSolids: 0.3 })).toBeGreaterThan(q);
    expect(() => solventLoadRate({ ...base, volumeSolids: 1 })).toThrow(/volumeSolids must be < 1/);
  });
});

describe('solventVentilationCaution', () => {
  // One mole per second of vapour at 0 °C and 1 atm occupies the molar volume of an ideal gas,
  // 22.413 969 54 L/mol (CODATA 2018: V_m = RT/p at 273.15 K, 101.325 kPa).
  const oneMolePerSecond = { solventMassRate: 0.092141, molarMass: 0.092141, lowerFlammableLimit: 0.011, exhaustTemperature: 273.15 };

  it('holds the exhaust to 25 % LFL, or 50 % with continuous monitoring (NFPA 86, Standard for Ovens and Furnaces)', () => {
    const plain = solventVentilationCaution({ ...oneMolePerSecond, continuousMonitoring: false });
    const monitored = solventVentilationCaution({ ...oneMolePerSecond, continuousMonitoring: true });
    expect(plain.lflFraction).toBe(0.25);
    expect(monitored.lflFraction).toBe(0.5);
    expect(rel(plain.freshAirRequired, 2 * monitored.freshAirRequired)).toBeLessThan(1e-12);
  });

  it('sizes fresh air from the vapour volume at exhaust conditions (ideal gas; CODATA molar volume)', () => {
    const c = solventVentilationCaution({ ...oneMolePerSecond, continuousMonitoring: false });
    expect(rel(c.vapourVolumeRate, 0.02241396954)).toBeLessThan(1e-8);
    expect(rel(c.freshAirRequired, 0.02241396954 / (0.25 * 0.011))).toBeLessThan(1e-8);
    // Hotter exhaust, larger vapour volume: V ∝ T (Charles's law).
    const hot = solventVentilationCaution({ ...oneMolePerSecond, exhaustTemperature: 2 * 273.15, continuousMonitoring: false });
    expect(rel(hot.vapourVolumeRate, 2 * c.vapourVolumeRate)).toBeLessThan(1e-12);
  });

  it('defers to NFPA 86 / EN 1539 and the authority having jurisdiction and disclaims safety design', () => {
    const c = solventVentilationCaution({ ...oneMolePerSecond, continuousMonitoring: true });
    expect(c.text).toMatch(/NFPA 86 \/ EN 1539/);
    expect(c.text).toMatch(/authority having jurisdiction/);
    expect(c.text).toMatch(/50 %/);
    expect(c.text).toMatch(/continuous solvent-vapour monitoring/);
    expect(c.notice).toMatch(/not a safety design tool/);
    expect(Object.isFrozen(c)).toBe(true);
  });

  it('rejects an LFL given in percent instead of a fraction', () => {
    expect(() => solventVentilationCaution({ ...oneMolePerSecond, lowerFlammableLimit: 1.1, continuousMonitoring: false })).toThrow(
      /lowerFlammableLimit must be a volume fraction/,
    );
  });
});
