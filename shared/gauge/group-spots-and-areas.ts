/** One reading as the grouping needs it: its wet thickness and an id to point back to it. */
export interface GroupableReading {
  readonly id: string | number;
  /** [m] */
  readonly thickness: number;
}

/** Specified thickness range a spot and an area are judged against [m]; null = no limit on that side. */
export interface ThicknessSpec {
  readonly minimum: number | null;
  readonly maximum: number | null;
}

export type SpotVerdict = 'within' | 'below' | 'above';
export type AreaVerdict = 'within' | 'below' | 'above';

export interface Spot {
  /** 1-based number within the run. */
  readonly number: number;
  readonly readingIds: readonly (string | number)[];
  /** Mean of the readings [m]. */
  readonly mean: number;
  readonly min: number;
  readonly max: number;
  /** Against 80 % of the minimum and 120 % of the maximum. */
  readonly verdict: SpotVerdict;
}

export interface Area {
  readonly number: number;
  readonly spotNumbers: readonly number[];
  /** Mean of the spot means [m]. */
  readonly mean: number;
  /** Against the specified minimum and maximum themselves. */
  readonly verdict: AreaVerdict;
  /** False when the run ended before 5 spots. */
  readonly complete: boolean;
}

export interface SpotGrouping {
  readonly spots: readonly Spot[];
  readonly areas: readonly Area[];
  /** Readings left over at the end of the run: fewer than needed for a spot (not judged). */
  readonly leftoverReadingIds: readonly (string | number)[];
  /** The spot limits used: 80 % of the minimum, 120 % of the maximum [m]. */
  readonly spotLimits: ThicknessSpec;
}

export interface SpotGroupingOptions {
  /** Readings per spot, ≥ 3 (default 3). */
  readonly readingsPerSpot?: number;
  /** Spots per area (default 5). */
  readonly spotsPerArea?: number;
  /** Spot tolerance as fractions of the limits (default 0.8 and 1.2). */
  readonly spotLowFraction?: number;
  readonly spotHighFraction?: number;
}

/** SSPC-PA 2 grouping constants (see groupSpotsAndAreas). */
export const SSPC_MIN_READINGS_PER_SPOT = 3;
export const SSPC_SPOTS_PER_AREA = 5;
export const SSPC_SPOT_LOW_FRACTION = 0.8;
export const SSPC_SPOT_HIGH_FRACTION = 1.2;

/**
 * Group one run's readings (in measuring order) into spots and areas the way coating-thickness
 * practice does, and judge them against a specified thickness range.
 *
 * ## Method
 * A spot is the mean of ≥ 3 consecutive readings (taken within a small circle on the part); an area
 * is 5 consecutive spots. A spot passes when its mean is ≥ 80 % of the specified minimum and ≤ 120 %
 * of the specified maximum; an area when the mean of its spots lies within the specified range
 * itself. Readings left at the end that cannot make a full spot are reported, not judged; a last
 * area with fewer than 5 spots is marked incomplete.
 * The 80 %/120 % spot tolerance is the level SSPC-PA 2 uses by default (restriction level —
 * verify against the edition in force); the area rule is recalled (from memory — verify).
 *
 * ## References
 * - SSPC-PA 2, "Procedure for Determining Conformance to Dry Coating Thickness Requirements"
 *   (SSPC: The Society for Protective Coatings; spot = ≥ 3 readings, area = 5 spots).
 * - ASTM D7091, "Nondestructive Measurement of Dry Film Thickness…" (gauge calibration and verification).
 *
 * @param readings - one run's readings in measuring order, thickness [m]
 * @param spec - specified minimum and maximum [m]
 * @param options - readings per spot (≥ 3), spots per area, spot tolerance fractions
 * @returns spots, areas, left-over readings and the spot limits used
 * @throws RangeError when readingsPerSpot < 3 or a limit is not positive
 * @example groupSpotsAndAreas(fifteen, { minimum: 8 * 25.4e-6, maximum: 12 * 25.4e-6 }).spots.length // 5
 */
export function groupSpotsAndAreas(readings: readonly GroupableReading[], spec: ThicknessSpec, options: SpotGroupingOptions = {}): SpotGrouping {
  const perSpot = options.readingsPerSpot ?? SSPC_MIN_READINGS_PER_SPOT;
  const perArea = options.spotsPerArea ?? SSPC_SPOTS_PER_AREA;
  const lowFraction = options.spotLowFraction ?? SSPC_SPOT_LOW_FRACTION;
  const highFraction = options.spotHighFraction ?? SSPC_SPOT_HIGH_FRACTION;
  if (!Number.isInteger(perSpot) || perSpot < SSPC_MIN_READINGS_PER_SPOT) {
    throw new RangeError(`readingsPerSpot must be a whole number ≥ ${SSPC_MIN_READINGS_PER_SPOT}, got ${perSpot}`);
  }
  if (!Number.isInteger(perArea) || perArea < 1) throw new RangeError(`spotsPerArea must be a whole number ≥ 1, got ${perArea}`);
  for (const [name, value] of [['minimum', spec.minimum], ['maximum', spec.maximum]] as const) {
    if (value !== null && !(value > 0)) throw new RangeError(`spec.${name} must be > 0 m or null, got ${value}`);
  }
  if (spec.minimum !== null && spec.maximum !== null && spec.minimum > spec.maximum) {
    throw new RangeError('spec.minimum must not exceed spec.maximum');
  }
  const spotLimits: ThicknessSpec = {
    minimum: spec.minimum === null ? null : spec.minimum * lowFraction,
    maximum: spec.maximum === null ? null : spec.maximum * highFraction,
  };
  const judge = (value: number, limits: ThicknessSpec): SpotVerdict =>
    limits.minimum !== null && value < limits.minimum ? 'below' : limits.maximum !== null && value > limits.maximum ? 'above' : 'within';

  const spots: Spot[] = [];
  const full = readings.length - (readings.length % perSpot);
  for (let start = 0; start < full; start += perSpot) {
    const group = readings.slice(start, start + perSpot);
    const values = group.map((r) => r.thickness);
    const mean = values.reduce((sum, v) => sum + v, 0) / values.length;
    spots.push(
      Object.freeze({
        number: spots.length + 1,
        readingIds: group.map((r) => r.id),
        mean,
        min: Math.min(...values),
        max: Math.max(...values),
        verdict: judge(mean, spotLimits),
      }),
    );
  }
  const areas: Area[] = [];
  for (let start = 0; start < spots.length; start += perArea) {
    const group = spots.slice(start, start + perArea);
    const mean = group.reduce((sum, s) => sum + s.mean, 0) / group.length;
    areas.push(
      Object.freeze({
        number: areas.length + 1,
        spotNumbers: group.map((s) => s.number),
        mean,
        verdict: judge(mean, spec),
        complete: group.length === perArea,
      }),
    );
  }
  return Object.freeze({ spots, areas, leftoverReadingIds: readings.slice(full).map((r) => r.id), spotLimits });
}
