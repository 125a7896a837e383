import { onsetCaseInputSchema, type OnsetCaseResult } from '../../schemas/onset';
import { evaluateLayer } from '../sizing/evaluate-layer';
import { criticalMarangoni } from '../stability/critical-marangoni';
import { criticalRayleigh } from '../stability/critical-rayleigh';
import { onsetMargin } from '../stability/onset-margin';
import { regimeLabels } from '../stability/regime-labels';

const finiteOrNull = (value: number): number | null => (Number.isFinite(value) ? value : null);

const EMPTY: Omit<OnsetCaseResult, 'id' | 'error'> = Object.freeze({
  rayleigh: null,
  marangoni: null,
  biot: null,
  prandtl: null,
  bond: null,
  crispation: null,
  galileo: null,
  criticalRayleigh: null,
  criticalMarangoni: null,
  cellMargin: null,
  criticalWavenumber: null,
  wavelength: null,
  margin: null,
  regime: null,
  longWave: null,
  maxStableDepth: null,
  minStableDepth: null,
  maxDeltaT: null,
});

/**
 * Evaluate one batch case (a CSV row or JSON object) into one result row; never throws.
 *
 * ## Method
 * The case is checked with `onsetCaseInputSchema`. A dimensionless case is solved directly
 * (onsetMargin with a flat surface; omitted biot = conducting top for a rigid or free top, 0 for a
 * 'surface' top), so margin = cellMargin. A physical case goes through `evaluateLayer`: all groups,
 * the most dangerous mode including the deformable surface on a 'surface' top (so margin ≤
 * cellMargin), wavelength 2πd/k_c of the flat cellular mode, maxStableDepth, minStableDepth and
 * maxDeltaT = margin × deltaT. criticalRayleigh is pure buoyancy with a flat surface (Ma = 0) and
 * criticalMarangoni pure thermocapillarity (Ra = 0, 'surface' top only), both at the case's Bi.
 * Infinite or inapplicable values are null. A bad case gets `error` naming each bad field and the
 * problem; nothing else is filled in.
 *
 * ## References
 * - Pearson J. R. A. (1958) J. Fluid Mech. 4, 489–500. doi:10.1017/S0022112058000616
 * - Nield D. A. (1964) J. Fluid Mech. 19, 341–352. doi:10.1017/S0022112064000763
 * - VanHook S. J. et al. (1997) J. Fluid Mech. 345, 45–78. doi:10.1017/S0022112097006101
 *
 * @param raw - one case: an object of field → number or text (CSV cells), SI units
 * @returns one result in the documented field order (see onsetCaseResultFields)
 * @example evaluateCase({ id: 'p1', bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', rayleigh: 0, marangoni: 40 }).margin // ≈ 1.99
 */
export function evaluateCase(raw: unknown): OnsetCaseResult {
  const rawId =
    raw !== null && typeof raw === 'object' && 'id' in raw && (typeof raw.id === 'string' || typeof raw.id === 'number') ? String(raw.id).trim() : '';
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    return { id: rawId, ...EMPTY, error: 'case must be an object of field names and values' };
  }
  const parsed = onsetCaseInputSchema.safeParse(raw);
  if (!parsed.success) {
    const error = parsed.error.issues.map((issue) => `${issue.path.join('.') || 'case'}: ${issue.message}`).join('; ');
    return { id: rawId, ...EMPTY, error };
  }
  const input = parsed.data;
  try {
    if (input.kind === 'dimensionless') {
      const { problem } = input;
      const onset = onsetMargin(problem);
      const boundaries = { bottom: problem.bottom, bottomThermal: problem.bottomThermal, top: problem.top, biot: problem.biot };
      return {
        id: input.id,
        ...EMPTY,
        rayleigh: problem.rayleigh,
        marangoni: problem.marangoni,
        biot: problem.biot === Infinity ? 'Infinity' : problem.biot,
        criticalRayleigh: finiteOrNull(criticalRayleigh(boundaries).value),
        criticalMarangoni: problem.top === 'surface' ? finiteOrNull(criticalMarangoni(boundaries).value) : null,
        cellMargin: finiteOrNull(onset.cellMargin),
        criticalWavenumber: finiteOrNull(onset.cellWavenumber),
        margin: finiteOrNull(onset.margin),
        regime: regimeLabels[onset.regime] as OnsetCaseResult['regime'],
        longWave: onset.longWave,
        error: null,
      };
    }
    const evaluation = evaluateLayer(input.layer);
    const { groups } = evaluation;
    return {
      id: input.id,
      rayleigh: groups.rayleigh,
      marangoni: groups.marangoni,
      biot: groups.biot,
      prandtl: groups.prandtl,
      bond: groups.bond,
      crispation: groups.crispation,
      galileo: groups.galileo,
      criticalRayleigh: finiteOrNull(evaluation.criticalRayleigh.value),
      criticalMarangoni: evaluation.criticalMarangoni ? finiteOrNull(evaluation.criticalMarangoni.value) : null,
      cellMargin: finiteOrNull(evaluation.cellMargin),
      criticalWavenumber: finiteOrNull(evaluation.criticalWavenumber),
      wavelength: finiteOrNull(evaluation.wavelength),
      margin: finiteOrNull(evaluation.margin),
      regime: evaluation.regimeLabel as OnsetCaseResult['regime'],
      longWave: evaluation.longWave,
      maxStableDepth: evaluation.maxStableDepth.found ? evaluation.maxStableDepth.depth : null,
      minStableDepth: evaluation.minStableDepth.found ? evaluation.minStableDepth.depth : null,
      maxDeltaT: finiteOrNull(evaluation.maxDeltaT.mostDangerous),
      error: null,
    };
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    return { id: input.id, ...EMPTY, error: message };
  }
}
