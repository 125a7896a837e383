import type { FluidLaws } from '../fluids/fluid-laws';
import { readLayerInput, type LayerFields } from '../fluids/read-layer-input';
import { layerGroups } from '../physics/sizing/layer-groups';
import { layerStabilityProblem } from '../physics/sizing/layer-stability-problem';
import { validatePhysicalLayer } from '../physics/sizing/validate-physical-layer';
import { onsetMargin } from '../physics/stability/onset-margin';

/**
 * Onset margin of the released layer at another wet thickness: the margin-only path of the physics
 * core (no sizing searches), with the same choice of mode as the layer check itself.
 *
 * ## Method
 * The check's fields with the depth replaced by `thickness` are read into a physical layer
 * (`readLayerInput`: ΔT from the heating at this depth, e.g. ΔT = q d/k for a heat flux or
 * (T_b − T_a)·Bi/(1 + Bi) with Bi = h d/k for plate and air temperatures); then
 * λ* = onsetMargin(Ra, Ma, Bi, Cr, Bo) as in `evaluateLayer`. Like the layer check, the margin is
 * the most dangerous mode (deformable surface) when the top is a free surface that may deform, and
 * the flat cellular margin otherwise.
 *
 * ## References
 * - Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500, doi:10.1017/S0022112058000616.
 * - Nield D.A. (1964) J. Fluid Mech. 19:341–352, doi:10.1017/S0022112064000763.
 *
 * @param fields - the released check's layer fields (from the snapshot)
 * @param laws - fluid laws frozen at the snapshot (frozenFluidLaws)
 * @param thickness - wet film thickness d [m], > 0
 * @param heating - heating to use instead of the check's (e.g. from a reading's temperatures)
 * @returns λ* [-]; Infinity when no onset is possible
 * @throws RangeError naming the field when the layer cannot be built at this thickness
 * @example snapshotMarginAt(fields, laws, 0.5e-3) // 2 for a Pearson check set at onset at 1 mm
 */
export function snapshotMarginAt(fields: LayerFields, laws: FluidLaws, thickness: number, heating?: LayerFields['heating']): number {
  return snapshotOnsetAt(fields, laws, thickness, heating).margin;
}

/**
 * {@link snapshotMarginAt} with the mode that sets the margin: `longWave` is true when the
 * deformable surface's long-wave thinning is the most dangerous mode (always false for a check
 * judged with a flat surface).
 *
 * @returns `{ margin, longWave }`; margin [-] is Infinity when no onset is possible
 * @example snapshotOnsetAt(fields, laws, 30e-6).longWave // true below the long-wave kink
 */
export function snapshotOnsetAt(
  fields: LayerFields,
  laws: FluidLaws,
  thickness: number,
  heating?: LayerFields['heating'],
): { margin: number; longWave: boolean } {
  if (!(thickness > 0) || !Number.isFinite(thickness)) throw new RangeError(`thickness must be > 0 m, got ${thickness}`);
  const read = readLayerInput({ ...fields, depth: `${thickness} m`, heating: heating ?? fields.heating }, laws);
  if (!read.ok) {
    const [field, message] = Object.entries(read.fields)[0] ?? ['_', 'the layer could not be read'];
    throw new RangeError(`${field}: ${message}`);
  }
  const layer = validatePhysicalLayer(read.value.layer);
  const onset = onsetMargin(layerStabilityProblem(layer, layerGroups(layer), { deformable: true }));
  const deformable = fields.top === 'surface' && fields.deformableSurface;
  return deformable ? { margin: onset.margin, longWave: onset.longWave } : { margin: onset.cellMargin, longWave: false };
}
