import { describe, expect, it } from 'vitest';
import { baseStateDeltaT, deltaTFromEvaporation, deltaTFromHeatFlux, deltaTFromSurfaceTemperatures, evaporativeHeatFlux } from './index';

const rel = (a: number, b: number) => Math.abs(a / b - 1);

// Hand calculations from steady 1-D conduction (Bergman et al. 2011, "Fundamentals of Heat and Mass
// Transfer", 7th ed.: eq. 3.3 Fourier's law, §3.1.3 resistances in series, eq. 6.62 evaporative flux).
describe('base state: temperature drop across the liquid', () => {
  it('series resistances: plate 80 °C, air 20 °C, h 10 W/(m²·K), 1 mm, k 0.15 → 3.75 K', () => {
    // R_liquid = 1e-3/0.15 = 6.6667e-3, R_air = 1/10 = 0.1 m²K/W; q = 60/0.1066667 = 562.5 W/m²;
    // ΔT = q·R_liquid = 562.5 × 6.6667e-3 = 3.75 K
    const dT = deltaTFromSurfaceTemperatures({ substrateTemperature: 353.15, airTemperature: 293.15, heatTransfer: 10, depth: 1e-3, conductivity: 0.15 });
    expect(rel(dT, 3.75)).toBeLessThan(1e-10);
  });
  it('series resistances: no heat loss (h = 0) gives no drop; hotter air gives a negative drop', () => {
    expect(deltaTFromSurfaceTemperatures({ substrateTemperature: 353.15, airTemperature: 293.15, heatTransfer: 0, depth: 1e-3, conductivity: 0.15 })).toBe(0);
    // Bi = 100 × 1e-3 / 0.5 = 0.2; ΔT = −30 × 0.2/1.2 = −5 K
    const dT = deltaTFromSurfaceTemperatures({ substrateTemperature: 293.15, airTemperature: 323.15, heatTransfer: 100, depth: 1e-3, conductivity: 0.5 });
    expect(rel(dT, -5)).toBeLessThan(1e-10);
  });
  it('heat flux: 1 kW/m² through 50 µm of k 0.15 W/(m·K) → 0.3333 K', () => {
    // 1000 × 50e-6 / 0.15 = 0.05/0.15 = 0.33333 K
    expect(rel(deltaTFromHeatFlux({ heatFlux: 1000, depth: 50e-6, conductivity: 0.15 }), 1 / 3)).toBeLessThan(1e-12);
  });
  it('evaporation: 1 g/(m²·s) × 400 kJ/kg = 400 W/m²; through 100 µm of k 0.2 → 0.2 K', () => {
    expect(rel(evaporativeHeatFlux({ evaporationFlux: 1e-3, latentHeat: 4e5 }), 400)).toBeLessThan(1e-12);
    // 400 × 1e-4 / 0.2 = 0.2 K
    expect(rel(deltaTFromEvaporation({ evaporationFlux: 1e-3, latentHeat: 4e5, depth: 1e-4, conductivity: 0.2 }), 0.2)).toBeLessThan(1e-12);
  });
  it('evaporation of water: 0.1 g/(m²·s) × 2257 kJ/kg through 1 mm, k 0.6 → 0.3762 K', () => {
    // L(100 °C) = 2257 kJ/kg (Bergman et al. 2011 Table A.6); q = 225.7 W/m²; 225.7 × 1e-3 / 0.6 = 0.37617 K
    expect(rel(deltaTFromEvaporation({ evaporationFlux: 1e-4, latentHeat: 2.257e6, depth: 1e-3, conductivity: 0.6 }), 0.376167)).toBeLessThan(1e-5);
  });
  it('dispatches each way of describing the heating', () => {
    const layer = { depth: 1e-3, conductivity: 0.15 };
    expect(baseStateDeltaT({ kind: 'deltaT', deltaT: 7 }, layer)).toBe(7);
    expect(rel(baseStateDeltaT({ kind: 'surfaceTemperatures', substrateTemperature: 353.15, airTemperature: 293.15, heatTransfer: 10 }, layer), 3.75)).toBeLessThan(1e-10);
    expect(rel(baseStateDeltaT({ kind: 'heatFlux', heatFlux: 150 }, layer), 1)).toBeLessThan(1e-12);
    expect(rel(baseStateDeltaT({ kind: 'evaporation', evaporationFlux: 1e-3, latentHeat: 1.5e5 }, layer), 1)).toBeLessThan(1e-12);
  });
  it('names the field on bad input', () => {
    expect(() => deltaTFromHeatFlux({ heatFlux: 1, depth: -1, conductivity: 1 })).toThrow(/depth must be > 0/);
    expect(() => evaporativeHeatFlux({ evaporationFlux: Number.NaN, latentHeat: 1 })).toThrow(/evaporationFlux/);
  });
});
