import { create, createUnitDependencies, unitDependencies, type MathJsInstance } from 'mathjs';

/**
 * Build a small units-only instance of the units library, with the poise and the stokes added.
 *
 * ## Method
 * `create({ unitDependencies, createUnitDependencies })` pulls in only the unit parser and
 * `createUnit`, which keeps the client bundle small (about 70 kB gzip instead of the whole library).
 * The library has no poise or stokes, so they are defined once here with short prefixes, which gives
 * cP and cSt: 1 P = 0.1 Pa·s and 1 St = 10⁻⁴ m²/s (exact, CGS definitions).
 *
 * A factory rather than ad-hoc calls on a shared instance, so that no other module can add units to
 * the instance parsing everyone's input; {@link unitMath} is the one frozen instance built from it.
 *
 * ## References
 * - Thompson A., Taylor B. N. (2008) "Guide for the Use of the International System of Units (SI)",
 *   NIST Special Publication 811, Appendix B.8 (poise, stokes).
 * - mathjs documentation, "Units" and "Custom bundling" (https://mathjs.org/docs/).
 *
 * @returns a new units instance with P and St defined
 * @example createUnitMath().unit(1, 'cP').toNumber('Pa s') // 0.001
 */
export function createUnitMath(): MathJsInstance {
  const math = create({ unitDependencies, createUnitDependencies }) as MathJsInstance;
  math.createUnit('P', { definition: '0.1 Pa s', prefixes: 'short' });
  math.createUnit('St', { definition: '1e-4 m^2/s', prefixes: 'short' });
  return math;
}

/**
 * The one units instance used by parsing, formatting and conversion. It is frozen so that no caller
 * can add or redefine units at run time (a module-level instance is kept because building one costs a
 * few milliseconds and its content never changes).
 */
export const unitMath: MathJsInstance = Object.freeze(createUnitMath());
