import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';

/**
 * Temperature drop across a liquid layer on a plate at T_b under air at T_a, ΔT = (T_b − T_a)·Bi/(1 + Bi).
 *
 * ## Method
 * Steady one-dimensional conduction through the liquid in series with convection from its surface.
 * The same heat flux q crosses both resistances (per unit area): the liquid d/k and the surface film
 * 1/h. So T_b − T_a = q·(d/k + 1/h) and ΔT = q·d/k, hence
 * ΔT = (T_b − T_a)·(d/k)/(d/k + 1/h) = (T_b − T_a)·Bi/(1 + Bi) with Bi = h d/k.
 * Bi → 0 (no heat loss) gives ΔT → 0; Bi → ∞ puts the whole drop across the liquid. Radiation and
 * evaporation at the surface are not included (fold them into h when they matter).
 *
 * ## References
 * - Bergman T. L., Lavine A. S., Incropera F. P., DeWitt D. P. (2011) "Fundamentals of Heat and Mass
 *   Transfer", 7th ed., Wiley, §3.1.3 (thermal resistances in series), eq. 3.12–3.14.
 *
 * @param input.substrateTemperature - plate (bottom) temperature T_b [K]
 * @param input.airTemperature - air temperature T_a [K]
 * @param input.heatTransfer - surface coefficient h [W/(m²·K)], ≥ 0
 * @param input.depth - layer depth d [m], > 0
 * @param input.conductivity - liquid conductivity k [W/(m·K)], > 0
 * @returns ΔT across the liquid, bottom minus surface [K] (negative when the air is hotter)
 * @example deltaTFromSurfaceTemperatures({ substrateTemperature: 353.15, airTemperature: 293.15, heatTransfer: 10, depth: 1e-3, conductivity: 0.15 }) // 3.75
 */
export function deltaTFromSurfaceTemperatures(input: {
  substrateTemperature: number;
  airTemperature: number;
  heatTransfer: number;
  depth: number;
  conductivity: number;
}): number {
  const tb = requirePositive('substrateTemperature', input.substrateTemperature, 'K');
  const ta = requirePositive('airTemperature', input.airTemperature, 'K');
  const h = requirePositive('heatTransfer', input.heatTransfer, 'W/(m²·K)', { allowZero: true });
  const d = requirePositive('depth', input.depth, 'm');
  const k = requirePositive('conductivity', input.conductivity, 'W/(m·K)');
  requireFinite('substrateTemperature − airTemperature', tb - ta, 'K');
  const biot = (h * d) / k;
  return ((tb - ta) * biot) / (1 + biot);
}
