/**
 * Sulfur activity for the adsorption model from a mill-test sulfur content, in the dilute
 * (Henrian, 1 wt % standard state) approximation the Fe–S constants were fitted with.
 *
 * ## Method
 * a_S ≈ [wt % S] = ppm / 10⁴. Interaction with other solutes (e.g. e_S^S, O, Mn) is ignored, which
 * is reasonable for the tens-to-hundreds of ppm met in weldable steels.
 *
 * ## References
 * - Sahoo P., DebRoy T., McNallan M. J. (1988) Metall. Trans. B 19:483–491 (activity in wt %).
 *   doi:10.1007/BF02657748
 *
 * @param sulfurPpm - sulfur content, 0 … 10 000 [ppm by mass]
 * @returns activity on the 1 wt % scale [wt %]
 * @example sulfurActivityFromPpm(50) // 0.005
 */
export function sulfurActivityFromPpm(sulfurPpm: number): number {
  if (!(sulfurPpm >= 0 && sulfurPpm <= 10_000)) {
    throw new RangeError(`sulfurPpm must be from 0 to 10000 ppm, got ${sulfurPpm}`);
  }
  return sulfurPpm / 10_000;
}
