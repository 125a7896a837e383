import type { StabilityProblem } from '../stability/types';
import type { LayerGroups, PhysicalLayer } from './types';

/**
 * The dimensionless stability problem of a physical layer.
 *
 * ## Method
 * Boundaries from the layer; Ra, Ma and Bi from its groups. With `deformable: true` and a 'surface'
 * top, the crispation and static Bond numbers are added so the solver includes the deforming
 * surface (and its long-wave branch); otherwise the surface is flat. Thermocapillary stress acts
 * only on a 'surface' top (the solver ignores Ma elsewhere).
 *
 * ## References
 * - Davis S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435 (flat and deformable formulations).
 *
 * @param layer - the physical layer (SI)
 * @param groups - its groups from layerGroups
 * @param options - `deformable`: include crispation and Bond numbers on a 'surface' top
 * @returns the stability problem
 * @example layerStabilityProblem(layer, layerGroups(layer), { deformable: false }).rayleigh
 */
export function layerStabilityProblem(
  layer: PhysicalLayer,
  groups: LayerGroups,
  options: { deformable: boolean },
): StabilityProblem {
  const problem: StabilityProblem = {
    bottom: layer.bottom,
    bottomThermal: layer.bottomThermal,
    top: layer.top,
    biot: groups.biot,
    rayleigh: groups.rayleigh,
    marangoni: groups.marangoni,
  };
  if (options.deformable && layer.top === 'surface') {
    return { ...problem, crispation: groups.crispation, bond: groups.bond };
  }
  return problem;
}
