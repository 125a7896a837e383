import { requirePositive } from '../groups/require-positive';

const REFERENCE_TEMPERATURE = 647.096; // K
const REFERENCE_DENSITY = 322; // kg/m³
const REFERENCE_VISCOSITY = 1e-6; // Pa·s
const DILUTE = [1.67752, 2.20462, 0.6366564, -0.241605];
const RESIDUAL: readonly (readonly number[])[] = [
  [5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0, 0],
  [8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0, 0, 0],
  [-1.08374, 1.88797, -7.72479e-1, 0, 0, 0, 0],
  [-2.89555e-1, 1.26613, -4.89837e-1, 0, 6.98452e-2, 0, -4.35673e-3],
  [0, 0, -2.5704e-1, 0, 0, 8.72102e-3, 0],
  [0, 1.20573e-1, 0, 0, 0, 0, -5.93264e-4],
];

/**
 * Viscosity of ordinary water from temperature and density, IAPWS 2008 formulation (industrial form).
 *
 * ## Method
 * μ/μ* = μ̄₀(T̄)·μ̄₁(T̄, ρ̄)·μ̄₂ with T̄ = T/647.096 K, ρ̄ = ρ/322 kg/m³, μ* = 1 µPa·s.
 * Dilute-gas part μ̄₀ = 100 √T̄ / Σᵢ Hᵢ/T̄ⁱ (i = 0..3); residual part
 * μ̄₁ = exp[ρ̄ Σᵢ Σⱼ Hᵢⱼ (1/T̄ − 1)ⁱ (ρ̄ − 1)ʲ] (i = 0..5, j = 0..6); the critical enhancement μ̄₂ is
 * set to 1, as the release allows outside a small region near the critical point. Valid over the
 * release's range (liquid water 273.16–1173.15 K up to 1 GPa, less near the critical point); stated
 * uncertainty about 1 % for the liquid at ambient pressure.
 *
 * ## References
 * - IAPWS (2008) "Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary Water
 *   Substance", IAPWS R12-08, eqs. 10–12, Tables 1–2.
 * - Huber M. L., Perkins R. A., Laesecke A., Friend D. G., Sengers J. V., Assael M. J., Metaxa I. N.,
 *   Vogel E., Mareš R., Miyagawa K. (2009) "New international formulation for the viscosity of H₂O",
 *   J. Phys. Chem. Ref. Data 38(2), 101–125. doi:10.1063/1.3088050
 *
 * @param temperature - absolute temperature [K], > 0
 * @param density - mass density [kg/m³], > 0
 * @returns dynamic viscosity [Pa·s]
 * @example waterViscosityFromDensity(298.15, 998) // ≈ 8.89735100e-4
 */
export function waterViscosityFromDensity(temperature: number, density: number): number {
  const tBar = requirePositive('temperature', temperature, 'K') / REFERENCE_TEMPERATURE;
  const rhoBar = requirePositive('density', density, 'kg/m³') / REFERENCE_DENSITY;
  let diluteSum = 0;
  for (let i = 0; i < DILUTE.length; i += 1) diluteSum += DILUTE[i] / tBar ** i;
  const mu0 = (100 * Math.sqrt(tBar)) / diluteSum;
  const x = 1 / tBar - 1;
  const y = rhoBar - 1;
  let residualSum = 0;
  for (let i = 0; i < RESIDUAL.length; i += 1) {
    for (let j = 0; j < RESIDUAL[i].length; j += 1) {
      if (RESIDUAL[i][j] !== 0) residualSum += RESIDUAL[i][j] * x ** i * y ** j;
    }
  }
  const mu1 = Math.exp(rhoBar * residualSum);
  return mu0 * mu1 * REFERENCE_VISCOSITY;
}
