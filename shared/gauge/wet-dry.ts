/**
 * Volume solids of a coating after thinning.
 *
 * ## Method
 * Adding T volumes of thinner per volume of coating (volumes taken as additive) dilutes the solids:
 * VS' = VS/(1 + T). Derived from the definition of volume solids (solids volume ÷ total volume).
 *
 * @param volumeSolids - volume solids fraction of the coating as supplied, 0 < VS ≤ 1 [-]
 * @param thinner - thinner added, volumes per volume of coating, T ≥ 0 [-] (0.1 = 10 %)
 * @returns volume solids fraction as applied [-]
 * @throws RangeError naming the parameter when out of range
 * @example thinnedVolumeSolids(0.6, 0.2) // 0.5
 */
export function thinnedVolumeSolids(volumeSolids: number, thinner: number): number {
  if (!(volumeSolids > 0 && volumeSolids <= 1)) throw new RangeError(`volumeSolids must be > 0 and ≤ 1, got ${volumeSolids}`);
  if (!(thinner >= 0 && thinner <= 10)) throw new RangeError(`thinner must be ≥ 0 and ≤ 10 volumes per volume, got ${thinner}`);
  return volumeSolids / (1 + thinner);
}

/**
 * Dry film thickness from wet film thickness.
 *
 * ## Method
 * DFT = WFT × VS', with VS' the volume solids as applied (thinnedVolumeSolids): the solvent leaves
 * and the solids volume stays on the same area (common practice for the relation; the thinning
 * step VS' = VS/(1 + T) is derived, volumes additive).
 *
 * @param wetThickness - WFT [m], > 0
 * @param volumeSolids - volume solids fraction as supplied, 0 < VS ≤ 1 [-]
 * @param thinner - thinner added, volumes per volume, ≥ 0 [-]; default 0
 * @returns DFT [m]
 * @example dryThicknessFromWet(100e-6, 0.6, 0.2) // 50e-6
 */
export function dryThicknessFromWet(wetThickness: number, volumeSolids: number, thinner = 0): number {
  if (!(wetThickness > 0)) throw new RangeError(`wetThickness must be > 0 m, got ${wetThickness}`);
  return wetThickness * thinnedVolumeSolids(volumeSolids, thinner);
}

/**
 * Wet film thickness from a dry reading, so that dry gauges can be judged against a wet window.
 *
 * ## Method
 * WFT = DFT / VS', the inverse of dryThicknessFromWet.
 *
 * @param dryThickness - DFT [m], > 0
 * @param volumeSolids - volume solids fraction as supplied, 0 < VS ≤ 1 [-]
 * @param thinner - thinner added, volumes per volume, ≥ 0 [-]; default 0
 * @returns WFT [m]
 * @example wetThicknessFromDry(50e-6, 0.6, 0.2) // 100e-6
 */
export function wetThicknessFromDry(dryThickness: number, volumeSolids: number, thinner = 0): number {
  if (!(dryThickness > 0)) throw new RangeError(`dryThickness must be > 0 m, got ${dryThickness}`);
  return dryThickness / thinnedVolumeSolids(volumeSolids, thinner);
}
