import { requireFinite } from '../groups/require-finite';
import { requirePositive } from '../groups/require-positive';
import type { PhysicalLayer } from './types';

/**
 * Check every field of a physical layer and return a frozen copy.
 *
 * ## Method
 * Boundary words must be one of the allowed values; density, viscosity, conductivity, heat capacity,
 * surface tension and depth must be finite and > 0; heat-transfer coefficient and gravity finite and
 * ≥ 0; expansion, dσ/dT and ΔT finite (any sign). The first failing field is named in the error.
 *
 * ## References
 * - STYLE.md §4 of this project (RangeError naming the parameter and unit).
 *
 * @param layer - the layer to check (SI)
 * @returns a frozen copy of the layer
 * @throws RangeError naming the first bad field, its limit and unit
 * @example validatePhysicalLayer({ ...layer, depth: -1 }) // throws "depth must be > 0 [m], got -1"
 */
export function validatePhysicalLayer(layer: PhysicalLayer): PhysicalLayer {
  if (layer === null || typeof layer !== 'object') throw new RangeError('layer must be an object');
  if (layer.bottom !== 'rigid' && layer.bottom !== 'free') throw new RangeError(`bottom must be rigid or free, got ${String(layer.bottom)}`);
  if (layer.bottomThermal !== 'conducting' && layer.bottomThermal !== 'insulating') {
    throw new RangeError(`bottomThermal must be conducting or insulating, got ${String(layer.bottomThermal)}`);
  }
  if (layer.top !== 'rigid' && layer.top !== 'free' && layer.top !== 'surface') {
    throw new RangeError(`top must be rigid, free or surface, got ${String(layer.top)}`);
  }
  requirePositive('density', layer.density, 'kg/m³');
  requirePositive('viscosity', layer.viscosity, 'Pa·s');
  requirePositive('conductivity', layer.conductivity, 'W/(m·K)');
  requirePositive('heatCapacity', layer.heatCapacity, 'J/(kg·K)');
  requireFinite('expansion', layer.expansion, '1/K');
  requirePositive('surfaceTension', layer.surfaceTension, 'N/m');
  requireFinite('dSigmaDT', layer.dSigmaDT, 'N/(m·K)');
  requirePositive('depth', layer.depth, 'm');
  requireFinite('deltaT', layer.deltaT, 'K');
  requirePositive('heatTransfer', layer.heatTransfer, 'W/(m²·K)', { allowZero: true });
  requirePositive('gravity', layer.gravity, 'm/s²', { allowZero: true });
  return Object.freeze({ ...layer });
}
