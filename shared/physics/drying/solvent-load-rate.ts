import { requirePositive } from '../groups/require-positive';

/**
 * Volume rate of liquid solvent a coating line carries into the oven (all of it evaporates when the
 * film dries fully): the solvent load used to size ventilation.
 *
 * ## Method
 * V̇ = WFT·(1 − VS)·w·v: wet film thickness times the solvent volume fraction (one minus the volume
 * solids, volumes taken as additive) times web width times line speed.
 *
 * ## References
 * - Mass (volume) balance on the coated web, derived from the stated inputs; DFT = WFT × volume
 *   solids is the coating trade's standard conversion (ASTM D7091 context; common practice).
 *
 * @param input.wetThickness - WFT [m], > 0
 * @param input.volumeSolids - VS, solids volume fraction [-], in [0, 1)
 * @param input.webWidth - coated width [m], > 0
 * @param input.lineSpeed - web speed [m/s], > 0
 * @returns liquid solvent volume rate [m³/s]
 * @example solventLoadRate({ wetThickness: 50e-6, volumeSolids: 0.4, webWidth: 1.5, lineSpeed: 100 / 60 }) // 7.5e-5 (= 4.5 L/min)
 */
export function solventLoadRate(input: { wetThickness: number; volumeSolids: number; webWidth: number; lineSpeed: number }): number {
  const wft = requirePositive('wetThickness', input.wetThickness, 'm');
  const vs = requirePositive('volumeSolids', input.volumeSolids, '-', { allowZero: true });
  if (vs >= 1) throw new RangeError(`volumeSolids must be < 1 [-], got ${vs}`);
  const w = requirePositive('webWidth', input.webWidth, 'm');
  const v = requirePositive('lineSpeed', input.lineSpeed, 'm/s');
  return wft * (1 - vs) * w * v;
}
