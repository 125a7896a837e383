import { requireFinite } from '../groups/require-finite';
import { deltaTFromEvaporation } from './delta-t-from-evaporation';
import { deltaTFromHeatFlux } from './delta-t-from-heat-flux';
import { deltaTFromSurfaceTemperatures } from './delta-t-from-surface-temperatures';
import type { Heating } from './heating';

/**
 * Temperature drop across the liquid in the conduction state, from any of the ways a user describes
 * the heating.
 *
 * ## Method
 * Dispatches on `heating.kind`: `deltaT` as given; `surfaceTemperatures` by series resistances,
 * ΔT = (T_b − T_a)·Bi/(1 + Bi) ({@link deltaTFromSurfaceTemperatures}); `heatFlux` by Fourier's law,
 * ΔT = q d/k ({@link deltaTFromHeatFlux}); `evaporation` with q = ṁ L, ΔT = ṁ L d/k
 * ({@link deltaTFromEvaporation}).
 *
 * ## References
 * - Bergman T. L. et al. (2011) "Fundamentals of Heat and Mass Transfer", 7th ed., eq. 3.3, §3.1.3, eq. 6.62.
 *
 * @param heating - how the layer is heated
 * @param layer.depth - d [m], > 0
 * @param layer.conductivity - k [W/(m·K)], > 0
 * @returns ΔT, bottom minus surface [K]
 * @example baseStateDeltaT({ kind: 'heatFlux', heatFlux: 1000 }, { depth: 50e-6, conductivity: 0.15 }) // ≈ 0.3333
 */
export function baseStateDeltaT(heating: Heating, layer: { depth: number; conductivity: number }): number {
  switch (heating.kind) {
    case 'deltaT':
      return requireFinite('deltaT', heating.deltaT, 'K');
    case 'surfaceTemperatures':
      return deltaTFromSurfaceTemperatures({ ...heating, ...layer });
    case 'heatFlux':
      return deltaTFromHeatFlux({ heatFlux: heating.heatFlux, ...layer });
    case 'evaporation':
      return deltaTFromEvaporation({ evaporationFlux: heating.evaporationFlux, latentHeat: heating.latentHeat, ...layer });
    default: {
      const unknown: never = heating;
      throw new RangeError(`heating.kind must be deltaT, surfaceTemperatures, heatFlux or evaporation, got ${JSON.stringify(unknown)}`);
    }
  }
}
