import type { FluidLaws } from '../fluids/fluid-laws';
import type { LayerFields } from '../fluids/read-layer-input';
import { pchipInterpolate } from '../physics/sizing/pchip-interpolate';
import { parseQuantity } from '../units/parse-quantity';
import { frozenFluidLaws, snapshotLayerFields, type GaugeSnapshot } from './snapshot-layer';
import { snapshotOnsetAt } from './snapshot-margin-at';

/** Substrate and air temperatures measured with a reading [K]; null when not measured. */
export interface ReadingTemperatures {
  readonly substrateTemperature?: number | null;
  readonly airTemperature?: number | null;
}

/** Where the margin crosses a level along the thickness axis [m]; null when it does not within the table. */
export interface ThicknessLimits {
  /** Largest wet thickness before cells (margin falls below the level above it). */
  readonly upper: number | null;
  /** Smallest wet thickness (long-wave thinning below it), or null. */
  readonly lower: number | null;
}

/** A precomputed margin-versus-thickness table of one released check, with fast lookups. */
export interface MarginJudge {
  readonly alertThreshold: number;
  /** The check's own wet thickness [m]. */
  readonly checkThickness: number;
  /** Range of the table [m]; outside it every lookup is a direct solve. */
  readonly thicknessRange: readonly [number, number];
  /** Tabulated thicknesses [m] and margins (null = no onset), for charts. */
  readonly curve: { readonly thickness: readonly number[]; readonly margin: readonly (number | null)[] };
  /** Margin 1 and the alert threshold as thickness limits at the check's heating. */
  readonly quietLimits: ThicknessLimits;
  readonly closeLimits: ThicknessLimits;
  /** Whether a reading's temperatures can change the drive (the check gives a top heat-transfer coefficient). */
  readonly temperaturesUsable: boolean;
  /**
   * Onset margin at a wet thickness [m] (and the reading's temperatures when usable); null when no
   * onset is possible (infinite margin).
   */
  margin(thickness: number, temperatures?: ReadingTemperatures): number | null;
  /** How many direct solves were made so far (table nodes included). */
  solves(): number;
}

export interface MarginJudgeOptions {
  /** Table nodes, 20–2000; default 200. */
  readonly points?: number;
  /** Table span as a factor below and above the check's thickness; default 10 (d/10 … 10 d). */
  readonly span?: number;
}

interface Table {
  readonly logDepths: number[];
  readonly margins: number[];
  readonly logMargins: number[];
  /** Whether long-wave thinning sets the margin at each node. */
  readonly longWave: boolean[];
}

/**
 * Judge gauge readings against a signed sheet's snapshot quickly: the margin depends only on the
 * wet thickness (and, when given, the substrate and air temperatures), so it is tabulated once and
 * interpolated for every reading.
 *
 * ## Method
 * 1. The released layer is rebuilt from the snapshot (snapshotLayerFields, frozenFluidLaws); the
 *    margin at one thickness is a direct solve (snapshotMarginAt).
 * 2. `points` thicknesses spaced evenly in ln d over [d₀/span, d₀·span] are solved once. Between
 *    nodes ln λ is interpolated against ln d by monotone piecewise cubic Hermite interpolation
 *    (PCHIP; the margins follow power laws in d, so ln λ is nearly linear in ln d). Where the most
 *    dangerous mode changes between two nodes (cells ↔ long-wave thinning, a kink in λ(d)), each
 *    mode's curve is extended from its own side and the lower value taken, as the solver takes the
 *    minimum over modes. A segment with a node of infinite margin, and any thickness outside the
 *    table, is solved directly.
 * 3. Temperatures: with plate and air temperatures and the check's top heat-transfer coefficient h,
 *    ΔT = (T_b − T_a)·Bi/(1 + Bi), Bi = h d/k, and the margin scales as 1/ΔT at fixed d (Ra and Ma
 *    are proportional to ΔT; Bi, Cr and Bo are not). So one table at T_b − T_a = ±1 K (per sign)
 *    serves every reading: λ(d, T_b, T_a) = λ₁(d)/|T_b − T_a|. A missing temperature is taken
 *    from the check when its heating gives it. Without h the temperatures cannot set the drive;
 *    the reading is judged at the check's heating (`temperaturesUsable` = false).
 * Accuracy against direct solves (create-margin-judge.test.ts, bench/gauge-import.bench.ts): relative
 * error below 1e-4 asserted, about 1e-6 measured, with 200 nodes over d/10 … 10 d for the layers tested
 * (flat Pearson layer; deformable primer film with buoyancy, plate and air, across the long-wave kink).
 *
 * ## References
 * - Fritsch F.N., Carlson R.E. (1980) SIAM J. Numer. Anal. 17(2):238–246 (monotone cubic interpolation).
 * - Pearson J.R.A. (1958) J. Fluid Mech. 4:489–500 (margin ∝ 1/ΔT at fixed Bi).
 * - Bergman T.L. et al. (2011) Fundamentals of Heat and Mass Transfer, 7th ed., §3.1 (series resistances).
 *
 * @param snapshot - a signed sheet revision's snapshot
 * @param options - table size and span
 * @returns the judge
 * @throws RangeError when the snapshot's layer cannot be rebuilt
 * @example createMarginJudge(snapshot).margin(60e-6) // onset margin at 60 µm wet
 */
export function createMarginJudge(snapshot: GaugeSnapshot, options: MarginJudgeOptions = {}): MarginJudge {
  const points = Math.round(options.points ?? 200);
  if (!(points >= 20 && points <= 2000)) throw new RangeError(`points must be 20–2000, got ${points}`);
  const span = options.span ?? 10;
  if (!(span > 1 && span <= 1000)) throw new RangeError(`span must be > 1 and ≤ 1000, got ${span}`);
  const fields = snapshotLayerFields(snapshot);
  const laws = frozenFluidLaws(snapshot);
  const checkThickness = parseQuantity(fields.depth, 'length');
  const lo = Math.log(checkThickness / span);
  const hi = Math.log(checkThickness * span);
  const logDepths = Array.from({ length: points }, (_, i) => lo + ((hi - lo) * i) / (points - 1));
  let solveCount = 0;

  const solveOnset = (thickness: number, heating?: LayerFields['heating']) => {
    solveCount += 1;
    return snapshotOnsetAt(fields, laws, thickness, heating);
  };
  const solve = (thickness: number, heating?: LayerFields['heating']): number => solveOnset(thickness, heating).margin;
  const buildTable = (heating?: LayerFields['heating']): Table => {
    const onsets = logDepths.map((x) => solveOnset(Math.exp(x), heating));
    const margins = onsets.map((o) => o.margin);
    return {
      logDepths,
      margins,
      logMargins: margins.map((m) => (Number.isFinite(m) && m > 0 ? Math.log(m) : NaN)),
      longWave: onsets.map((o) => o.longWave),
    };
  };

  const base = buildTable();
  const direct = new Map<string, number>();
  const lookup = (table: Table, thickness: number, heating: LayerFields['heating'] | undefined, key: string): number => {
    const x = Math.log(thickness);
    if (x >= lo && x <= hi) {
      const step = (hi - lo) / (points - 1);
      const i = Math.min(points - 2, Math.max(0, Math.floor((x - lo) / step)));
      const a = table.margins[i];
      const b = table.margins[i + 1];
      if (!Number.isFinite(a) && !Number.isFinite(b) && a > 0 && b > 0) return Infinity;
      const finite = (k: number) => k >= 0 && k < points && Number.isFinite(table.logMargins[k]);
      if (table.longWave[i] !== table.longWave[i + 1] && finite(i - 1) && finite(i) && finite(i + 1) && finite(i + 2)) {
        // The mode changes inside this segment (a kink, where long-wave thinning takes over from
        // cells): each mode is smooth, so extend each side's own curve into the segment and take
        // the lower, as the solver does (the margin is the minimum over modes).
        const left = pchipInterpolate(table.logDepths.slice(Math.max(0, i - 2), i + 1), table.logMargins.slice(Math.max(0, i - 2), i + 1), x);
        const right = pchipInterpolate(table.logDepths.slice(i + 1, Math.min(points, i + 4)), table.logMargins.slice(i + 1, Math.min(points, i + 4)), x);
        return Math.exp(Math.min(left, right));
      }
      if (table.longWave[i] === table.longWave[i + 1] && Number.isFinite(table.logMargins[i]) && Number.isFinite(table.logMargins[i + 1])) {
        // PCHIP on the finite nodes of the same mode around the segment (at most 4 nodes are used).
        const same = (k: number) => Number.isFinite(table.logMargins[k]) && table.longWave[k] === table.longWave[i];
        let first = i;
        while (first > 0 && first > i - 1 && same(first - 1)) first -= 1;
        let last = i + 1;
        while (last < points - 1 && last < i + 2 && same(last + 1)) last += 1;
        return Math.exp(pchipInterpolate(table.logDepths.slice(first, last + 1), table.logMargins.slice(first, last + 1), x));
      }
    }
    const cacheKey = `${key}|${thickness}`;
    let value = direct.get(cacheKey);
    if (value === undefined) {
      value = solve(thickness, heating);
      direct.set(cacheKey, value);
    }
    return value;
  };

  // Temperatures → substrate-and-air heating with the check's h, tabulated at T_b − T_a = ±1 K.
  const heating = fields.heating;
  const hText = heating.heatTransferCoefficient;
  const temperaturesUsable = hText !== undefined && parseQuantity(hText, 'heatTransferCoefficient') > 0;
  const checkSubstrate = heating.mode === 'substrate-air' ? parseQuantity(heating.substrateTemperature, 'temperature') : null;
  const checkAir = heating.mode === 'substrate-air' ? parseQuantity(heating.airTemperature, 'temperature') : null;
  const evaluationTemperature = snapshot.results.operatingPoint.temperature;
  const unitHeating = (sign: 1 | -1): LayerFields['heating'] => ({
    mode: 'substrate-air',
    substrateTemperature: `${evaluationTemperature + sign * 0.5} K`,
    airTemperature: `${evaluationTemperature - sign * 0.5} K`,
    heatTransferCoefficient: hText as string,
  });
  const signedTables = new Map<1 | -1, Table>();
  const signedTable = (sign: 1 | -1): Table => {
    let table = signedTables.get(sign);
    if (!table) {
      table = buildTable(unitHeating(sign));
      signedTables.set(sign, table);
    }
    return table;
  };

  const margin = (thickness: number, temperatures: ReadingTemperatures = {}): number | null => {
    if (!(thickness > 0) || !Number.isFinite(thickness)) throw new RangeError(`thickness must be > 0 m, got ${thickness}`);
    const given = temperatures.substrateTemperature != null || temperatures.airTemperature != null;
    let value: number;
    if (given && temperaturesUsable) {
      const substrate = temperatures.substrateTemperature ?? checkSubstrate;
      const air = temperatures.airTemperature ?? checkAir;
      if (substrate == null || air == null) {
        value = lookup(base, thickness, undefined, 'base');
      } else {
        const difference = substrate - air;
        if (difference === 0) return null;
        const sign = difference > 0 ? 1 : -1;
        value = lookup(signedTable(sign), thickness, unitHeating(sign), `t${sign}`) / Math.abs(difference);
      }
    } else {
      value = lookup(base, thickness, undefined, 'base');
    }
    return Number.isFinite(value) ? value : null;
  };

  const limitsAt = (level: number): ThicknessLimits => thicknessLimits(base, level, (t) => margin(t) ?? Infinity);

  return Object.freeze({
    alertThreshold: fields.alertThreshold ?? 1.25,
    checkThickness,
    thicknessRange: [Math.exp(lo), Math.exp(hi)] as const,
    curve: {
      thickness: logDepths.map((x) => Math.exp(x)),
      margin: base.margins.map((m) => (Number.isFinite(m) ? m : null)),
    },
    quietLimits: limitsAt(1),
    closeLimits: limitsAt(fields.alertThreshold ?? 1.25),
    temperaturesUsable,
    margin,
    solves: () => solveCount,
  });
}

/**
 * Upper and lower thickness where the margin crosses `level`: the first crossing from ≥ level to
 * < level with rising thickness (cells above it), and the last crossing from < level to ≥ level
 * below that one (long-wave thinning below it). Bisection on the interpolated margin to 1e-9 in ln d.
 */
function thicknessLimits(table: Table, level: number, marginAt: (thickness: number) => number): ThicknessLimits {
  const n = table.logDepths.length;
  const quiet = table.margins.map((m) => m >= level);
  const refine = (i: number): number => {
    let a = table.logDepths[i];
    let b = table.logDepths[i + 1];
    const quietAtA = quiet[i];
    for (let k = 0; k < 60 && b - a > 1e-9; k += 1) {
      const mid = (a + b) / 2;
      if (marginAt(Math.exp(mid)) >= level === quietAtA) a = mid;
      else b = mid;
    }
    return Math.exp((a + b) / 2);
  };
  let upperIndex = -1;
  for (let i = 0; i + 1 < n; i += 1) {
    if (quiet[i] && !quiet[i + 1]) {
      upperIndex = i;
      break;
    }
  }
  let lowerIndex = -1;
  for (let i = (upperIndex === -1 ? n - 1 : upperIndex) - 1; i >= 0; i -= 1) {
    if (!quiet[i] && quiet[i + 1]) {
      lowerIndex = i;
      break;
    }
  }
  return { upper: upperIndex === -1 ? null : refine(upperIndex), lower: lowerIndex === -1 ? null : refine(lowerIndex) };
}
