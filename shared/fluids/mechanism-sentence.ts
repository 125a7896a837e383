import { formatQuantity } from '../units/format-quantity';

/** A depth written in the unit people use at that scale (µm below 1 mm, mm below 1 m). */
export function formatDepth(depth: number): string {
  if (depth < 1e-3) return formatQuantity(depth, 'length', 'µm', 3);
  if (depth < 1) return formatQuantity(depth, 'length', 'mm', 3);
  return formatQuantity(depth, 'length', 'm', 3);
}

/**
 * One plain sentence saying which mechanism wins at this depth.
 *
 * ## Method
 * When the most dangerous mode is the long-wave one of a deformable surface (`longWave`), no cells
 * form first: thermocapillary stress pulls liquid away from warm spots faster than gravity levels
 * the surface, so the film thins and can break into dry spots (VanHook et al. 1997); the sentence
 * says so whatever the buoyancy ratio below. Otherwise, with a free surface, compare the buoyant and thermocapillary drives each against its own onset
 * value: r = (Ra/Ra_c)/(Ma/Ma_c) = Bo_d·Ma_c/Ra_c, Bo_d = Ra/Ma the dynamic Bond number (Nield 1964
 * shows the two drives add, Ra/Ra_c + Ma/Ma_c ≈ 1 on the neutral curve). r < 0.1: buoyancy
 * negligible; 0.1–0.5: surface tension dominates; 0.5–2: both; 2–10: buoyancy dominates; > 10:
 * surface tension negligible. Without a free surface only buoyancy can act.
 *
 * ## References
 * - Nield D.A. (1964) Surface tension and buoyancy effects in cellular convection. J. Fluid Mech. 19:341–352.
 * - Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500 (paint films cell whichever way up: not buoyancy).
 * - VanHook S.J. et al. (1997) Long-wavelength surface-tension-driven Bénard convection: experiment
 *   and theory. J. Fluid Mech. 345:45–78 (the long-wave deformational mode, thinning to dry spots).
 *
 * @param input.depth - layer depth [m]
 * @param input.hasSurface - true when the top is a free surface with surface-tension stress
 * @param input.longWave - true when the most dangerous mode is long-wave thinning of a deformable surface (default false)
 * @param input.dynamicBond - Ra/Ma [-] (null or non-finite when dσ/dT = 0)
 * @param input.rayleighCritical - Ra_c alone (Ma = 0) [-] (null = none)
 * @param input.marangoniCritical - Ma_c alone (Ra = 0) [-] (null = none)
 * @returns a sentence
 * @example mechanismSentence({ depth: 5e-5, hasSurface: true, dynamicBond: 2e-4, rayleighCritical: 669, marangoniCritical: 79.6 }) // 'At 50.0 µm buoyancy is negligible; surface tension drives the cells.'
 * @example mechanismSentence({ depth: 5e-5, hasSurface: true, longWave: true, dynamicBond: 2e-4, rayleighCritical: 669, marangoniCritical: 79.6 })
 *   // 'At 50.0 µm the surface gives way before any cells form: surface tension pulls liquid away from warm spots faster than gravity can level it, so the film thins and can break into dry spots (long-wave thinning).'
 */
export function mechanismSentence(input: {
  depth: number;
  hasSurface: boolean;
  longWave?: boolean;
  dynamicBond: number | null;
  rayleighCritical: number | null;
  marangoniCritical: number | null;
}): string {
  const at = `At ${formatDepth(input.depth)}`;
  if (!input.hasSurface) return `${at} there is no free surface, so only buoyancy can drive cells.`;
  if (input.longWave) {
    return `${at} the surface gives way before any cells form: surface tension pulls liquid away from warm spots faster than gravity can level it, so the film thins and can break into dry spots (long-wave thinning).`;
  }
  const { dynamicBond, rayleighCritical, marangoniCritical } = input;
  if (dynamicBond === null || !Number.isFinite(dynamicBond)) {
    return `${at} surface tension does not change with temperature (dσ/dT = 0), so only buoyancy can drive cells.`;
  }
  if (rayleighCritical === null || marangoniCritical === null) return `${at} surface tension drives any cells.`;
  const r = Math.abs(dynamicBond) * (marangoniCritical / rayleighCritical);
  if (r < 0.1) return `${at} buoyancy is negligible; surface tension drives the cells.`;
  if (r < 0.5) return `${at} surface tension drives the cells; buoyancy adds a little.`;
  if (r <= 2) return `${at} buoyancy and surface tension push about equally and reinforce each other.`;
  if (r <= 10) return `${at} buoyancy drives the cells; surface tension adds a little.`;
  return `${at} surface tension is negligible; buoyancy drives the cells.`;
}
