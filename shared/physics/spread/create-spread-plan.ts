import type { SpreadOptions, SpreadPlan, SpreadPropertySpec } from './spread-types';

/** Samples per random stream (each block starts 2⁶⁴ draws after the previous one). */
const BLOCK_SIZE = 1000;
const MAX_SAMPLES = 10_000_000;
/** Largest stated ± for a normal property (1σ); sign-flip redraws are Φ(−1/u) ≤ Φ(−2) ≈ 2.3 %. */
const MAX_NORMAL_UNCERTAINTY = 0.5;

/**
 * Validates a Property-spread request and freezes it into a plan that any worker can run a
 * piece of.
 *
 * ## Method
 * Checks every field and names it in the error; fixes the block size (1000 samples per random
 * stream), the percentile mode (exact when samples ≤ `exactPercentileLimit`, default 20 000;
 * otherwise 12 000 log-spaced bins from 10⁻⁶ to 10⁶, 1000 per decade, so a percentile inside that
 * range is within 10^(1/1000) − 1 = 0.23 % of the exact sample percentile) and the number of
 * samples used for sensitivity (default 20 000).
 *
 * ## References
 * - Saltelli A. et al. (2008) "Global Sensitivity Analysis: The Primer", Wiley, ch. 1.
 *   doi:10.1002/9780470725184
 *
 * @param options - base values, uncertain properties, sample count and seed
 * @returns a frozen plan [-]
 * @example createSpreadPlan({ base: { viscosity: 0.01 }, properties: [{ name: 'viscosity',
 *   relativeUncertainty: 0.1, distribution: 'normal' }], samples: 1000, seed: 1 }).percentileMode // 'exact'
 */
export function createSpreadPlan(options: SpreadOptions): SpreadPlan {
  const { base, properties, samples, seed } = options;
  if (!Number.isInteger(samples) || samples < 1 || samples > MAX_SAMPLES) {
    throw new RangeError(`samples must be a whole number from 1 to ${MAX_SAMPLES}, got ${samples}`);
  }
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new RangeError(`seed must be a whole number from 0 to ${Number.MAX_SAFE_INTEGER}, got ${seed}`);
  }
  const exactLimit = options.exactPercentileLimit ?? 20_000;
  if (!Number.isInteger(exactLimit) || exactLimit < 0) {
    throw new RangeError(`exactPercentileLimit must be a whole number ≥ 0, got ${exactLimit}`);
  }
  const sensitivityLimit = options.sensitivitySampleLimit ?? 20_000;
  if (!Number.isInteger(sensitivityLimit) || sensitivityLimit < 3 || sensitivityLimit > 1_000_000) {
    throw new RangeError(`sensitivitySampleLimit must be a whole number from 3 to 1000000, got ${sensitivityLimit}`);
  }
  if (properties.length === 0) throw new RangeError('properties must list at least one property to vary');
  const baseCopy: Record<string, number> = {};
  for (const [key, value] of Object.entries(base)) {
    if (!Number.isFinite(value)) throw new RangeError(`base.${key} must be a finite number, got ${value}`);
    baseCopy[key] = value;
  }
  const seen = new Set<string>();
  const checked: SpreadPropertySpec[] = properties.map((property, i) => {
    const label = `properties[${i}]`;
    if (typeof property.name !== 'string' || property.name.length === 0) {
      throw new RangeError(`${label}.name must be a non-empty string`);
    }
    if (seen.has(property.name)) throw new RangeError(`${label}.name "${property.name}" is listed twice`);
    seen.add(property.name);
    if (!(property.name in baseCopy)) {
      throw new RangeError(`${label}.name "${property.name}" has no value in base`);
    }
    if (baseCopy[property.name] === 0) {
      throw new RangeError(`base.${property.name} is 0, so a relative uncertainty cannot move it`);
    }
    const u = property.relativeUncertainty;
    if (property.distribution === 'normal') {
      if (!(u >= 0 && u <= MAX_NORMAL_UNCERTAINTY)) {
        throw new RangeError(
          `${label}.relativeUncertainty (${property.name}, normal 1σ) must be from 0 to ${MAX_NORMAL_UNCERTAINTY}, got ${u}`,
        );
      }
    } else if (property.distribution === 'uniform') {
      if (!(u >= 0 && u < 1)) {
        throw new RangeError(
          `${label}.relativeUncertainty (${property.name}, uniform half-width) must be ≥ 0 and < 1, got ${u}`,
        );
      }
    } else {
      throw new RangeError(`${label}.distribution must be 'normal' or 'uniform', got ${String(property.distribution)}`);
    }
    return Object.freeze({ name: property.name, relativeUncertainty: u, distribution: property.distribution });
  });
  return Object.freeze({
    version: 1 as const,
    base: Object.freeze(baseCopy),
    properties: Object.freeze(checked),
    samples,
    seed,
    blockSize: BLOCK_SIZE,
    percentileMode: samples <= exactLimit ? ('exact' as const) : ('histogram' as const),
    sensitivitySampleLimit: sensitivityLimit,
    histogram: Object.freeze({ lowerDecade: -6, upperDecade: 6, binsPerDecade: 1000 }),
  });
}
