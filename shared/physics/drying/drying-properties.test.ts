import { describe, expect, it } from 'vitest';
import { antoineVapourPressure } from './antoine-vapour-pressure';
import { chiltonColburnMassTransfer } from './chilton-colburn-mass-transfer';
import { evaporationFlux } from './evaporation-flux';
import { exponentialViscosity } from './exponential-viscosity';
import { filmViscosity } from './film-viscosity';
import { kriegerDoughertyViscosity } from './krieger-dougherty-viscosity';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('kriegerDoughertyViscosity', () => {
  // Krieger I.M., Dougherty T.J. (1959) Trans. Soc. Rheol. 3:137, μ/μ_s = (1 − φ/φ_m)^(−[η]φ_m), with the
  // stated [η] = 2.5 (Einstein) and φ_m = 0.64. Expected values worked by hand below from that formula.
  const kd = (phi: number) =>
    kriegerDoughertyViscosity({ solventViscosity: 1e-3, solidsFraction: phi, maxPackingFraction: 0.64, intrinsicViscosity: 2.5 });

  it('matches the 1959 formula at stated solids fractions', () => {
    // φ = 0.32: (1 − 0.5)^(−1.6) = 2^1.6 = 3.0314 (2^1.6 = e^(1.6·0.693147) = e^1.10904 = 3.03143)
    expect(rel(kd(0.32), 1e-3 * 3.03143)).toBeLessThan(1e-5);
    // φ = 0.48: (1 − 0.75)^(−1.6) = 4^1.6 = 2^3.2 = 9.18959
    expect(rel(kd(0.48), 1e-3 * 9.18959)).toBeLessThan(1e-5);
    // φ = 0.16: (0.75)^(−1.6) = e^(1.6·0.287682) = e^0.460291 = 1.58453
    expect(rel(kd(0.16), 1e-3 * 1.58453)).toBeLessThan(1e-5);
  });

  it('reduces to Einstein (1906) μ/μ_s → 1 + 2.5φ for dilute suspensions', () => {
    // Einstein A. (1906) Ann. Phys. 19:289 — independent of Krieger–Dougherty. The next term of the
    // expansion is n(n+1)/2·(φ/φ_m)² with n = 1.6, i.e. 5.08 φ² (derived), so allow 6 φ².
    for (const phi of [1e-4, 1e-3, 5e-3]) {
      expect(Math.abs(kd(phi) / 1e-3 - (1 + 2.5 * phi))).toBeLessThan(6 * phi * phi);
    }
  });

  it('diverges at the packing limit and rejects bad input', () => {
    expect(kd(0.64)).toBe(Number.POSITIVE_INFINITY);
    expect(kd(0.6399)).toBeGreaterThan(1);
    expect(() => kd(-0.1)).toThrow(/solidsFraction/);
    expect(() =>
      kriegerDoughertyViscosity({ solventViscosity: 0, solidsFraction: 0.1, maxPackingFraction: 0.64, intrinsicViscosity: 2.5 }),
    ).toThrow(/solventViscosity must be > 0/);
  });
});

describe('exponentialViscosity and filmViscosity', () => {
  it('follows ln(μ/μ_s) = Bφ (Arrhenius 1887 form)', () => {
    // e^5 = 148.413159 (hand/table value)
    expect(rel(exponentialViscosity({ solventViscosity: 1e-3, solidsFraction: 0.5, exponent: 10 }), 0.148413159)).toBeLessThan(1e-8);
  });

  it('applies the Andrade temperature law to the solvent part', () => {
    // Andrade E.N. da C. (1930) Nature 125:309: μ(T) = μ(T_ref)·exp(B(1/T − 1/T_ref)).
    // B = 1000 K, T_ref = 300 K, T = 350 K: exp(1000·(1/350 − 1/300)) = exp(−0.476190) = 0.621145
    const law = { kind: 'exponential' as const, solventViscosity: 1e-3, exponent: 0, referenceTemperature: 300, activationTemperature: 1000 };
    expect(rel(filmViscosity(law, 0.3, 350), 1e-3 * 0.621145)).toBeLessThan(1e-5);
  });
});

describe('antoineVapourPressure', () => {
  // NIST Chemistry WebBook (SRD 69), toluene, Antoine parameters for log10(P/bar) = A − B/(T + C):
  // A = 4.07827, B = 1343.943, C = −53.773 (308.52–384.66 K; Williamham, Taylor et al. 1945).
  const toluene = { a: 4.07827, b: 1343.943, c: -53.773 };

  it('gives one standard atmosphere at toluene’s normal boiling point', () => {
    // Normal boiling point 383.75 K (110.6 °C), NIST WebBook T_boil; 1 atm = 101.325 kPa.
    expect(rel(antoineVapourPressure(383.75, toluene), 101_325)).toBeLessThan(0.005);
  });

  it('matches the tabulated vapour pressure of toluene at 60 °C', () => {
    // An independent Antoine set (mmHg, °C): A 6.95464, B 1344.8, C 219.482 (Lange's Handbook of
    // Chemistry, toluene; from memory — verify) gives 10^(6.95464 − 1344.8/279.482) = 138.9 mmHg
    // = 18.52 kPa at 60 °C (worked by hand); Poling, Prausnitz & O'Connell (2001) tabulate the same
    // order. A 3 % band covers the two fits.
    expect(rel(antoineVapourPressure(333.15, toluene), 18_500)).toBeLessThan(0.03);
  });

  it('rejects temperatures at or below −C', () => {
    expect(() => antoineVapourPressure(50, toluene)).toThrow(/antoine\.c/);
    expect(() => antoineVapourPressure(0, toluene)).toThrow(/temperature must be > 0/);
  });
});

describe('chiltonColburnMassTransfer', () => {
  it('reduces to the Lewis relation k_m = h/(ρ c_p) when Le = 1', () => {
    // Lewis W.K. (1922) Mech. Eng. 44:445; Bergman et al. (2011) eq. 6.92 with Le = 1.
    const km = chiltonColburnMassTransfer({ heatTransferCoefficient: 60, airDensity: 1.2, airHeatCapacity: 1000, airThermalDiffusivity: 2e-5, vapourDiffusivity: 2e-5 });
    expect(rel(km, 60 / 1200)).toBeLessThan(1e-12);
  });

  it('scales with Le^(−2/3) (Chilton & Colburn 1934)', () => {
    // Le = 8 → Le^(2/3) = 4 exactly.
    const km = chiltonColburnMassTransfer({ heatTransferCoefficient: 60, airDensity: 1.2, airHeatCapacity: 1000, airThermalDiffusivity: 8e-5, vapourDiffusivity: 1e-5 });
    expect(rel(km, 60 / 1200 / 4)).toBeLessThan(1e-12);
  });
});

describe('evaporationFlux (gas side and in-film diffusion in series)', () => {
  const base = { ambientBackFlux: 0, solventFraction: 0.5, solventDensity: 870, thickness: 50e-6 };

  it('is gas-side controlled when Crank’s L ≪ 1', () => {
    const r = evaporationFlux({ ...base, gasSideConductance: 1e-3, diffusivity: 1e-3 });
    expect(r.filmMassBiot).toBeLessThan(1e-6);
    expect(rel(r.flux, 1e-3 * 0.5)).toBeLessThan(1e-6);
    expect(rel(r.surfaceSolventFraction, 0.5)).toBeLessThan(1e-5);
  });

  it('approaches the diffusion-limited (falling-rate) flux when L ≫ 1', () => {
    // Crank (1975) eq. 4.18, first term: rate constant π²D/(4h²) for a sheet sealed at its base.
    const D = 1e-13;
    const r = evaporationFlux({ ...base, gasSideConductance: 1e-2, diffusivity: D });
    const limit = (870 * Math.PI ** 2 * D * 0.5) / (4 * 50e-6);
    expect(r.filmMassBiot).toBeGreaterThan(1e3);
    expect(rel(r.flux, limit)).toBeLessThan(1e-3);
    expect(r.surfaceSolventFraction).toBeLessThan(1e-3);
  });

  it('tracks the exact first eigenvalue of Crank’s surface-evaporation problem within 10 %', () => {
    // Crank (1975) §4.3.2 eq. 4.54: β tan β = L; the slowest mode decays at D β₁²/h². The series
    // model's rate constant is (D/h²)·L/(1 + 4L/π²). β₁ is found here by bisection on [0, π/2).
    for (const L of [1e-3, 0.1, 1, 10, 100, 1e3]) {
      let lo = 0;
      let hi = Math.PI / 2 - 1e-15;
      for (let k = 0; k < 200; k++) {
        const mid = 0.5 * (lo + hi);
        if (mid * Math.tan(mid) < L) lo = mid;
        else hi = mid;
      }
      const exact = lo * lo;
      const D = 1e-10;
      const h = 50e-6;
      const G = (L * 870 * D) / h;
      const r = evaporationFlux({ ...base, gasSideConductance: G, diffusivity: D });
      const modelRate = r.flux / (870 * h * 0.5) / (D / (h * h));
      expect(rel(modelRate, exact)).toBeLessThan(0.1);
    }
  });

  it('never condenses: flux is 0 when the air already holds more vapour', () => {
    expect(evaporationFlux({ ...base, gasSideConductance: 1e-3, ambientBackFlux: 1e-3, diffusivity: 1e-9 }).flux).toBe(0);
  });
});
