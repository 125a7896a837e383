import type { LayerBoundaries, StabilityProblem } from './types';

/** A checked stability problem in the solver's internal form. */
export interface CheckedProblem {
  readonly rigidBottom: boolean;
  readonly insulatingBottom: boolean;
  readonly top: 'rigid' | 'free' | 'surface';
  /** Biot number of the top [-]; Infinity = conducting. */
  readonly biot: number;
  readonly rayleigh: number;
  /** Marangoni number [-]; forced to 0 unless the top is 'surface' (no thermocapillary stress otherwise). */
  readonly marangoni: number;
  /** Crispation number [-]; 0 = flat surface. */
  readonly crispation: number;
  /** Bond number [-]. */
  readonly bond: number;
}

/**
 * Check a stability problem (or bare boundaries) and bring it to the solver's internal form.
 *
 * ## Method
 * Field-by-field checks; each failure throws a RangeError naming the field and its limit.
 * Rules: bottom ∈ {rigid, free}; bottomThermal ∈ {conducting, insulating}; top ∈ {rigid, free,
 * surface}; biot ≥ 0 (Infinity allowed = conducting top); rayleigh and marangoni finite (any sign);
 * crispation finite ≥ 0 and only with top 'surface'; bond finite ≥ 0 and required when
 * crispation > 0 (a deformable surface needs gravity stated; 0 means no gravity).
 *
 * ## References
 * - QuietLayer conventions: Ra = gβΔT d³/(νκ), Ma = σ_T ΔT d/(μκ), Bi = h d/λ, Cr = μκ/(σd),
 *   Bo = ρgd²/σ (Davis, S. H. (1987) Annu. Rev. Fluid Mech. 19, 403–435.
 *   doi:10.1146/annurev.fl.19.010187.002155).
 *
 * @param problem - boundaries and optional operating point (Ra, Ma default 0 for bare boundaries)
 * @returns frozen checked problem
 * @example validateProblem({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: 0, rayleigh: 0, marangoni: 80 }).marangoni // 80
 */
export function validateProblem(problem: StabilityProblem | (LayerBoundaries & Partial<StabilityProblem>)): CheckedProblem {
  if (problem === null || typeof problem !== 'object') throw new RangeError('problem must be an object');
  const { bottom, bottomThermal, top, biot } = problem;
  if (bottom !== 'rigid' && bottom !== 'free') throw new RangeError(`bottom must be 'rigid' or 'free', got ${String(bottom)}`);
  if (bottomThermal !== 'conducting' && bottomThermal !== 'insulating')
    throw new RangeError(`bottomThermal must be 'conducting' or 'insulating', got ${String(bottomThermal)}`);
  if (top !== 'rigid' && top !== 'free' && top !== 'surface')
    throw new RangeError(`top must be 'rigid', 'free' or 'surface', got ${String(top)}`);
  if (typeof biot !== 'number' || Number.isNaN(biot) || biot < 0 || biot === -Infinity)
    throw new RangeError(`biot must be a number ≥ 0 (Infinity = conducting top), got ${String(biot)}`);
  const rayleigh = problem.rayleigh ?? 0;
  const marangoni = problem.marangoni ?? 0;
  if (typeof rayleigh !== 'number' || !Number.isFinite(rayleigh)) throw new RangeError(`rayleigh must be a finite number, got ${String(rayleigh)}`);
  if (typeof marangoni !== 'number' || !Number.isFinite(marangoni))
    throw new RangeError(`marangoni must be a finite number, got ${String(marangoni)}`);
  const crispation = problem.crispation ?? 0;
  if (typeof crispation !== 'number' || !Number.isFinite(crispation) || crispation < 0)
    throw new RangeError(`crispation must be a finite number ≥ 0, got ${String(crispation)}`);
  if (crispation > 0 && top !== 'surface') throw new RangeError(`crispation applies only to top 'surface', got top '${top}'`);
  const bond = problem.bond ?? (crispation > 0 ? undefined : 0);
  if (bond === undefined) throw new RangeError('bond is required (finite, ≥ 0) when crispation > 0');
  if (typeof bond !== 'number' || !Number.isFinite(bond) || bond < 0) throw new RangeError(`bond must be a finite number ≥ 0, got ${String(bond)}`);
  return Object.freeze({
    rigidBottom: bottom === 'rigid',
    insulatingBottom: bottomThermal === 'insulating',
    top,
    biot,
    rayleigh,
    marangoni: top === 'surface' ? marangoni : 0,
    crispation,
    bond,
  });
}
