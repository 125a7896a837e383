import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeDryingPath } from './compute-drying-path';
import { demoLine2DryingInput } from './demo-line-2';
import type { DryingPathInput } from './types';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** A plain film on a held plate with a fixed evaporation rate; every number is a stated test input. */
function fixedRateInput(overrides: Partial<DryingPathInput> = {}): DryingPathInput {
  return {
    wetThickness: 50e-6,
    solidsFraction: 0.3,
    solvent: {
      name: 'test solvent',
      density: 870,
      latentHeat: 4e5,
      molarMass: 0.092,
      volatility: { kind: 'fixed-rate', evaporationRate: 1e-3 },
      diffusivity: 1e-2, // huge: Crank's L ≈ 6e-9, so drying is purely gas-side controlled
      lowerFlammableLimit: 0.011,
    },
    film: {
      density: 1000,
      heatCapacity: 2000,
      conductivity: 0.15,
      expansion: 1e-3,
      surfaceTension: 0.03,
      surfaceTensionTemperatureSlope: -1e-4,
      surfaceTensionConcentrationSlope: -0.01,
    },
    viscosity: { kind: 'exponential', solventViscosity: 1e-3, exponent: 10 },
    oven: {
      transport: { kind: 'schedule' },
      zones: [
        { duration: 20, airTemperature: 330, heatTransferCoefficient: 50 },
        { duration: 30, airTemperature: 330, heatTransferCoefficient: 50 },
      ],
    },
    substrate: { kind: 'held', temperature: 330 },
    gridPoints: 41,
    ...overrides,
  };
}

describe('computeDryingPath: closed-form checks', () => {
  it('matches the exact constant-rate solution t = (ρ/r)[(s₀ − s) + p·ln(s₀/s)]', () => {
    // With ṁ = r·ψ, ψ = s/(s + p) (s solvent thickness, p = h₀φ₀ solids thickness), ds/dt = −(r/ρ)·s/(s + p)
    // separates to (s + p)/s ds = −(r/ρ) dt, integrated by hand. Independent of the integrator.
    const input = fixedRateInput();
    const r = computeDryingPath(input);
    const p = 50e-6 * 0.3;
    const s0 = 50e-6 * 0.7;
    r.series.time.forEach((t, i) => {
      const s = r.series.thickness[i] - p;
      const tExact = (870 / 1e-3) * (s0 - s + p * Math.log(s0 / s));
      expect(Math.abs(tExact - t)).toBeLessThan(1e-6 * Math.max(1, t));
    });
    expect(r.series.position).toBeNull();
  });

  it('heats a thermal-mass web exponentially toward the air temperature (lumped capacitance)', () => {
    // Bergman et al. (2011) Fundamentals of Heat and Mass Transfer, eq. 5.6: T = T∞ − (T∞ − T₀)·e^(−(h₁+h₂)t/C),
    // C = ρc·h + C_sub. Evaporation is made negligible (r = 1e-12 kg/(m²·s)).
    const input = fixedRateInput({
      solvent: { ...fixedRateInput().solvent, volatility: { kind: 'fixed-rate', evaporationRate: 1e-12 } },
      substrate: { kind: 'thermal-mass', arealHeatCapacity: 80, initialTemperature: 300 },
      oven: {
        transport: { kind: 'schedule' },
        zones: [{ duration: 10, airTemperature: 360, heatTransferCoefficient: 30, backHeatTransferCoefficient: 20 }],
      },
    });
    const r = computeDryingPath(input);
    const C = 1000 * 2000 * 50e-6 + 80;
    r.series.time.forEach((t, i) => {
      const exact = 360 - 60 * Math.exp((-50 * t) / C);
      expect(Math.abs(r.series.filmTemperature[i] - exact)).toBeLessThan(1e-5);
    });
  });

  it('gives ΔT = ṁLh/k across a film on a held plate when the air adds no heat (DOMAIN §3: 1 kW/m², 50 µm, k 0.15 → 0.33 K)', () => {
    // Derived in the domain notes: 1000 W/m² × 50e-6 m / 0.15 W/(m·K) = 0.3333 K.
    const latentHeat = 4e5;
    const rate = 1000 / latentHeat / 0.7; // so that ṁ = r·ψ₀ = 2.5e-3 kg/(m²·s), ṁL = 1000 W/m² at t = 0
    const input = fixedRateInput({
      solvent: { ...fixedRateInput().solvent, latentHeat, volatility: { kind: 'fixed-rate', evaporationRate: rate } },
      film: { ...fixedRateInput().film, conductivity: 0.15 },
    });
    const r = computeDryingPath(input);
    expect(rel(r.series.deltaT[0], 1 / 3)).toBeLessThan(1e-6);
  });
});

describe('computeDryingPath: mass balance (DFT = WFT × volume solids)', () => {
  it('keeps h·φ equal to h₀·φ₀ to the integrator tolerance on the Line 2 demo', () => {
    const r = computeDryingPath(demoLine2DryingInput());
    expect(r.massBalance.expectedDryThickness).toBeCloseTo(40e-6 * 0.35, 15);
    expect(r.massBalance.relativeError).toBeLessThan(1e-6);
    expect(r.massBalance.exitThickness).toBeGreaterThanOrEqual(r.massBalance.expectedDryThickness * (1 - 1e-6));
  });

  it('zone solvent losses add up to the film’s total solvent loss', () => {
    const input = demoLine2DryingInput();
    const r = computeDryingPath(input);
    const totalPerArea = r.zones.reduce((sum, z) => sum + z.solventEvaporatedPerArea, 0);
    const lost = input.solvent.density * (input.wetThickness * (1 - input.solidsFraction) - r.massBalance.exitThickness * r.massBalance.exitSolventFraction);
    expect(rel(totalPerArea, lost)).toBeLessThan(1e-9);
  });
});

describe('computeDryingPath: Line 2 demo', () => {
  const input = demoLine2DryingInput();
  const r = computeDryingPath(input);

  it('resolves zones at 30 m/min: 4 m / 6 m / 6 m → 8 s / 12 s / 12 s (derived)', () => {
    expect(r.zones.map((z) => z.residenceTime)).toEqual([8, 12, 12]);
    expect(r.zones.map((z) => z.endPosition)).toEqual([4, 10, 16]);
    r.series.time.forEach((t, i) => expect(r.series.position![i]).toBeCloseTo(0.5 * t, 12));
  });

  it('converts each zone’s solvent load to L/min across the 1.2 m web and attaches a ventilation caution', () => {
    for (const z of r.zones) {
      // kg/m² × (1.2 m × 0.5 m/s) = kg/s; ÷ 866.9 kg/m³ × 60 000 = L/min.
      expect(rel(z.solventMassRate!, z.solventEvaporatedPerArea * 0.6)).toBeLessThan(1e-12);
      expect(rel(z.solventLitresPerMinute!, (z.solventMassRate! / 866.9) * 60_000)).toBeLessThan(1e-12);
      expect(z.ventilation?.lflFraction).toBe(0.25);
      expect(z.ventilation?.text).toMatch(/authority having jurisdiction/);
    }
  });

  it('finds the solutal drive far stronger than the thermal one in a 40 µm film (Tönsmann et al. 2021; DOMAIN §3)', () => {
    expect(r.onset.minSolutalMargin).toBeLessThan(1);
    expect(r.onset.minThermalMargin).toBeGreaterThan(100 * r.onset.minSolutalMargin);
    expect(r.onset.drive).toBe('solutal');
    expect(r.onset.cellsPossibleAt).not.toBeNull();
  });

  it('locates margin crossings between the grid points that bracket them', () => {
    for (const e of r.events.filter((x) => x.kind === 'cells-possible' || x.kind === 'quiet-again')) {
      if (e.time === 0) continue;
      const m = e.drive === 'solutal' ? r.series.solutalMargin : r.series.thermalMargin;
      const i = r.series.time.findIndex((t) => t >= e.time);
      expect(i).toBeGreaterThan(0);
      expect((m[i - 1] - 1) * (m[i] - 1)).toBeLessThanOrEqual(0);
    }
  });

  it('reports the freeze where the viscosity crosses the threshold', () => {
    expect(r.onset.frozenBy).toBe('viscosity');
    const i = r.series.time.findIndex((t) => t >= r.onset.frozenAt!);
    expect(r.series.viscosity[i - 1]).toBeLessThan(1e3);
    expect(r.series.viscosity[i]).toBeGreaterThanOrEqual(1e3);
  });

  it('returns every series with one value per grid time', () => {
    const n = r.series.time.length;
    for (const [key, values] of Object.entries(r.series)) {
      if (values !== null) expect([key, values.length]).toEqual([key, n]);
    }
    // About gridPoints (default 121): each zone gets a share in proportion to its time.
    expect(n).toBeGreaterThanOrEqual(115);
    expect(n).toBeLessThanOrEqual(127);
  });
});

describe('computeDryingPath: verdicts', () => {
  it('is Quiet when the solvent does not change σ and the film is heated from above', () => {
    const input = fixedRateInput({ film: { ...fixedRateInput().film, surfaceTensionConcentrationSlope: 0 } });
    const r = computeDryingPath(input);
    expect(r.onset.verdict).toBe('quiet');
    expect(r.series.regime.every((x) => x === 'quiet')).toBe(true);
    expect(r.onset.cellsPossibleAt).toBeNull();
  });

  it('says cells die out when the film freezes long before one growth time', () => {
    // Hand estimate at t = 0: ṁ = 1e-3·0.7 = 7e-4 kg/(m²·s); Δc = ṁh/(ρD) = 7e-4·5e-5/(870·2e-9) = 0.0201;
    // L = 1e-3·5e-5/(870·2e-9) = 0.029; Ma_c = 1.2e-4·0.0201·5e-5/(1e-3·2e-9) ≈ 60, just past the
    // critical ≈ 52 of an impermeable base at L ≈ 0.03 (Nield 1964: 48 at L = 0), so the margin is ≈ 0.87
    // and the growth time (h²/D)/(1/λ − 1) ≈ 1.25 s/0.15 ≈ 8 s. The film counts as frozen at φ = 0.302,
    // reached after ≈ 0.002/(φṁ/(ρh)) ≈ 0.4 s: far less than one growth time.
    const input = fixedRateInput({
      solvent: { ...fixedRateInput().solvent, diffusivity: 2e-9 },
      film: { ...fixedRateInput().film, surfaceTensionConcentrationSlope: -1.2e-4 },
      viscosity: { kind: 'exponential', solventViscosity: 1e-3, exponent: 0 },
      freezeSolidsFraction: 0.302,
    });
    const r = computeDryingPath(input);
    expect(r.onset.cellsPossibleAt).not.toBeNull();
    expect(r.onset.growthExponent).toBeLessThan(1);
    expect(r.onset.verdict).toBe('cells-die-out');
  });
});

describe('computeDryingPath: properties (fast-check)', () => {
  it('a thicker film takes longer to dry', () => {
    fc.assert(
      fc.property(fc.double({ min: 10e-6, max: 80e-6, noNaN: true }), fc.double({ min: 1.1, max: 3, noNaN: true }), (h0, k) => {
        const dryAt = (wet: number) =>
          computeDryingPath(
            fixedRateInput({
              wetThickness: wet,
              freezeSolidsFraction: 0.9,
              gridPoints: 5,
              oven: { transport: { kind: 'schedule' }, zones: [{ duration: 600, airTemperature: 330, heatTransferCoefficient: 50 }] },
            }),
          ).onset.frozenAt;
        const thin = dryAt(h0);
        const thick = dryAt(h0 * k);
        expect(thin).not.toBeNull();
        expect(thick === null || thick > thin!).toBe(true);
      }),
      { numRuns: 15 },
    );
  });

  it('more solids means less solvent lost', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 0.6, noNaN: true }), fc.double({ min: 0.02, max: 0.2, noNaN: true }), (phi, dphi) => {
        const lost = (solids: number) =>
          computeDryingPath(demoLineInputWith(solids)).zones.reduce((sum, z) => sum + z.solventEvaporatedPerArea, 0);
        expect(lost(phi + dphi)).toBeLessThan(lost(phi));
      }),
      { numRuns: 10 },
    );
  });

  it('stays finite and conserves solids for random valid lines (2 µm–2 mm wet, 1–5 zones, held or thermal-mass web)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2e-6, max: 2e-3, noNaN: true }),
        fc.double({ min: 0.02, max: 0.6, noNaN: true }),
        fc.array(
          fc.record({ T: fc.double({ min: 290, max: 480, noNaN: true }), h: fc.double({ min: 0, max: 400, noNaN: true }), L: fc.double({ min: 0.2, max: 30, noNaN: true }) }),
          { minLength: 1, maxLength: 5 },
        ),
        fc.double({ min: 0.05, max: 10, noNaN: true }),
        fc.boolean(),
        fc.double({ min: 1e-13, max: 1e-8, noNaN: true }),
        (h0, phi, zones, speed, held, diffusivity) => {
          const input = demoLine2DryingInput();
          input.wetThickness = h0;
          input.solidsFraction = phi;
          input.gridPoints = 21;
          input.solvent.diffusivity = diffusivity;
          input.oven = {
            transport: { kind: 'line', lineSpeed: speed, webWidth: 1 },
            zones: zones.map((z) => ({ length: z.L, airTemperature: z.T, heatTransferCoefficient: z.h })),
          };
          if (held) input.substrate = { kind: 'held', temperature: 320 };
          const r = computeDryingPath(input);
          expect(r.massBalance.relativeError).toBeLessThan(1e-6);
          for (const values of Object.values(r.series)) {
            if (values !== null) for (const x of values) if (typeof x === 'number') expect(Number.isNaN(x)).toBe(false);
          }
        },
      ),
      { numRuns: 25 },
    );
  });

  it('margins recover as viscosity rises', () => {
    fc.assert(
      fc.property(fc.double({ min: 1.05, max: 100, noNaN: true }), (k) => {
        const base = demoLine2DryingInput();
        base.gridPoints = 31;
        const thicker = demoLine2DryingInput();
        thicker.gridPoints = 31;
        thicker.viscosity = { kind: 'exponential', solventViscosity: 0.56e-3 * k, exponent: 18 };
        const a = computeDryingPath(base).series;
        const b = computeDryingPath(thicker).series;
        a.solutalMargin.forEach((m, i) => expect(b.solutalMargin[i]).toBeGreaterThanOrEqual(m));
        a.thermalMargin.forEach((m, i) => expect(b.thermalMargin[i]).toBeGreaterThanOrEqual(m));
      }),
      { numRuns: 8 },
    );
  });
});

function demoLineInputWith(solids: number): DryingPathInput {
  const input = demoLine2DryingInput();
  input.solidsFraction = solids;
  input.gridPoints = 7;
  return input;
}

describe('computeDryingPath: bad input', () => {
  it('names the field and its limit', () => {
    expect(() => computeDryingPath(fixedRateInput({ wetThickness: -1e-6 }))).toThrow(/wetThickness must be > 0/);
    expect(() => computeDryingPath(fixedRateInput({ solidsFraction: 1 }))).toThrow(/solidsFraction must be < 1/);
    const line = demoLine2DryingInput();
    delete line.oven.zones[1].length;
    expect(() => computeDryingPath(line)).toThrow(/oven\.zones\[1\]\.length/);
    const noAir = demoLine2DryingInput();
    delete noAir.air;
    expect(() => computeDryingPath(noAir)).toThrow(/air properties are required/);
    expect(() => computeDryingPath(fixedRateInput({ gridPoints: 1 }))).toThrow(/gridPoints/);
  });
});

describe('computeDryingPath: margins wired to the stability solver', () => {
  it('a 3 mm cast layer on a held plate: Ra and Ma_T by hand, margin equal to a direct onsetMargin call', async () => {
    const { onsetMargin } = await import('../stability');
    // Thick layer, heat drawn up through it by evaporation (held plate, air at plate temperature).
    const input = fixedRateInput({ wetThickness: 3e-3, gridPoints: 3, oven: { transport: { kind: 'schedule' }, zones: [{ duration: 5, airTemperature: 330, heatTransferCoefficient: 10 }] } });
    const r = computeDryingPath(input);
    const s = r.series;
    const i = 0;
    const h = s.thickness[i];
    const mu = s.viscosity[i];
    const kappa = 0.15 / (1000 * 2000);
    // Chandrasekhar (1961) Ra = gβΔT h³/(νκ); Pearson (1958) Ma = −(dσ/dT)ΔT h/(μκ); Bi = h_air·h/k.
    const ra = (9.80665 * 1e-3 * s.deltaT[i] * h ** 3) / ((mu / 1000) * kappa);
    const ma = (1e-4 * s.deltaT[i] * h) / (mu * kappa);
    expect(rel(s.rayleigh[i], ra)).toBeLessThan(1e-12);
    expect(rel(s.thermalMarangoni[i], ma)).toBeLessThan(1e-12);
    expect(rel(s.thermalBiot[i], (10 * h) / 0.15)).toBeLessThan(1e-12);
    // Buoyancy is not negligible here (Ra/669 vs Ma/Ma_c), so the path must use the coupled solve.
    expect(ra / 669 / (ma / 80)).toBeGreaterThan(1e-3);
    const direct = onsetMargin({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: s.thermalBiot[i], rayleigh: ra, marangoni: ma });
    expect(rel(s.thermalMargin[i], direct.margin)).toBeLessThan(1e-9);
  });

  it('a deformable surface can only lower the margins of a flat one (extra long-wave mode)', () => {
    const flat = demoLine2DryingInput();
    flat.gridPoints = 9;
    const deformable = demoLine2DryingInput();
    deformable.gridPoints = 9;
    deformable.surface = 'deformable';
    const a = computeDryingPath(flat).series;
    const b = computeDryingPath(deformable).series;
    b.solutalMargin.forEach((m, i) => expect(m).toBeLessThanOrEqual(a.solutalMargin[i] * (1 + 5e-3)));
    b.thermalMargin.forEach((m, i) => expect(m).toBeLessThanOrEqual(a.thermalMargin[i] * (1 + 5e-3)));
  });
});
