/**
 * Round-number fluid for API tests: μ = 10 mPa·s, k = 0.1 W/(m·K), ρ = 1000 kg/m³, c_p = 1000 J/(kg·K)
 * → κ = 1e-7 m²/s; dσ/dT = −0.1 mN/(m·K) (the ordinary-liquid value, common practice); β = 0, so no
 * buoyancy. At d = 1 mm, Ma = σ_T·ΔT·d/(μκ) = 100·ΔT (hand calculation), and with Pearson's
 * Ma_c = 79.607 (Pearson 1958, J. Fluid Mech. 4, 489–500) onset comes at ΔT = 0.79607 K.
 * Properties stated for 10–30 °C. Spread it into a request body with a name of the test's own.
 */
export const roundFluid = {
  kind: 'other',
  referenceTemperature: '20 °C',
  validFrom: '10 °C',
  validTo: '30 °C',
  density: { value: '1000 kg/m³' },
  expansion: { value: '0 1/K' },
  viscosity: { law: 'points', points: [{ temperature: '20 °C', value: '10 mPa·s' }] },
  surfaceTension: { value: '30 mN/m' },
  surfaceTensionSlope: { value: '-0.1 mN/(m·K)' },
  conductivity: { value: '0.1 W/(m·K)' },
  heatCapacity: { value: '1000 J/(kg·K)' },
};
