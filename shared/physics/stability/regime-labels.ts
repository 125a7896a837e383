import type { Regime } from './types';

/**
 * Display labels of the regimes, in QuietLayer's vocabulary (DESIGN.md "Vocabulary").
 *
 * ## Method
 * Fixed wording; no computation.
 *
 * ## References
 * - QuietLayer design notes, vocabulary section.
 *
 * @example regimeLabels['long-wave-thinning'] // 'Long-wave thinning'
 */
export const regimeLabels: Readonly<Record<Regime, string>> = Object.freeze({
  quiet: 'Quiet',
  'surface-tension-cells': 'Surface-tension cells',
  'buoyancy-cells': 'Buoyancy cells',
  'mixed-cells': 'Mixed cells',
  'long-wave-thinning': 'Long-wave thinning',
});
