import { findRootBrent } from './find-root-brent';
import type { DepthBound } from './types';

/** Margins are clamped to e^±LOG_CAP (∞: no onset; 0: onset at any ΔT) so that the root finder sees finite values. */
const LOG_CAP = 50;

/** What {@link findDepthCrossing} needs to know. */
export interface DepthCrossingSearch {
  /** Margin λ*(d) of the mode in question [-] (Infinity allowed = no onset). */
  readonly margin: (depth: number) => number;
  /** Depth to start from [m] (the layer's own depth). */
  readonly startDepth: number;
  /** Search range [m]. */
  readonly minDepth: number;
  readonly maxDepth: number;
  /** Which side of the crossing is quiet: 'below' (cells above a maximum depth) or 'above' (thinning below a minimum depth). */
  readonly quietSide: 'below' | 'above';
  /** Expected power p in λ ∝ d^∓p, used only to size the bracketing steps (3 for buoyancy, 1 for Marangoni, 2 for long-wave). */
  readonly stepPower: number;
  /** Words for the mode, used in the messages (e.g. "cells", "long-wave thinning"). */
  readonly modeName: string;
  /** Tolerance on ln d, i.e. relative tolerance on the depth [-]; default {@link DEPTH_TOLERANCE}. */
  readonly tolerance?: number;
}

/**
 * Default tolerance on ln d (≈ relative on the depth). Depths are shown to 4 significant digits
 * (half a unit in the 4th digit is ≥ 5e-5 relative) and the reference tests ask for 2e-5 on the
 * depth including the solver's own error; Brent's method stops with the root inside
 * ±(tolerance/2 + 2·eps·|ln d|), so 1e-5 keeps the search error at ≤ 5e-6 plus rounding.
 */
export const DEPTH_TOLERANCE = 1e-5;

/**
 * Depth at which an onset margin crosses 1, searched outward from the layer's depth.
 *
 * ## Method
 * Work with g(d) = ln λ*(d) (clamped to ±50 for λ* = ∞ or 0), whose zero is the onset depth. From the start
 * depth, step geometrically toward the quiet side if the layer is in onset (g < 0), or toward the
 * onset side if it is quiet, until g changes sign; the step factor is (λ*)^(1/p)·1.05 clamped to
 * 1.25–10, which lands close to the root when λ* follows the expected power of depth; after the first
 * step, p is the power measured over the last step (clamped to 0.5–6) when that step moved toward
 * the crossing, a secant step in (ln d, ln λ*). The bracket is
 * then refined by Brent's method in ln d to a relative depth tolerance of 10⁻⁵ by default
 * ({@link DEPTH_TOLERANCE}). If the end of the
 * range is reached without a sign change, the answer says so: either quiet or in onset all the way.
 * The first crossing from the start depth is returned; a margin that is not monotone in depth can
 * have further crossings beyond it.
 *
 * ## References
 * - Brent R. P. (1973) "Algorithms for Minimization without Derivatives", Prentice-Hall, ch. 4.
 * - Press W. H. et al. (2007) "Numerical Recipes", 3rd ed., §9.1 (bracketing by expansion).
 *
 * @param search - margin function, start depth [m], range [m], quiet side, step power, mode name
 * @returns frozen {@link DepthBound}
 * @example findDepthCrossing({ margin: (d) => (1e-3 / d) ** 3, startDepth: 5e-4, minDepth: 1e-7, maxDepth: 10, quietSide: 'below', stepPower: 3, modeName: 'cells' }) // { found: true, depth ≈ 1e-3 }
 */
export function findDepthCrossing(search: DepthCrossingSearch): DepthBound {
  const { minDepth, maxDepth, quietSide, stepPower } = search;
  const g = (depth: number): number => {
    const m = search.margin(depth);
    if (Number.isNaN(m)) throw new RangeError(`margin is NaN at depth ${depth} m`);
    // Clamp to ±LOG_CAP: λ* = ∞ (no onset) and λ* = 0 (onset at any ΔT, e.g. no gravity on a deformable film).
    return Math.max(-LOG_CAP, Math.min(LOG_CAP, Math.log(m)));
  };
  const towardOnset = quietSide === 'below' ? 1 : -1; // +1: onset lies at larger depth
  // Work in x = ln d throughout so that the bracket ends are evaluated exactly as Brent's method sees them.
  const G = (x: number) => g(Math.exp(x));
  const startDepth = Math.min(maxDepth, Math.max(minDepth, search.startDepth));
  let x = Math.log(startDepth);
  let value = G(x);
  const startedQuiet = value >= 0;
  const direction = startedQuiet ? towardOnset : -towardOnset;
  const limitDepth = direction > 0 ? maxDepth : minDepth;
  const xLimit = Math.log(limitDepth);
  let power = stepPower;
  for (let step = 0; step < 200; step += 1) {
    if (x === xLimit) {
      const from = fmt(Math.min(startDepth, limitDepth));
      const to = fmt(Math.max(startDepth, limitDepth));
      return Object.freeze({
        found: false,
        reason: startedQuiet ? 'quiet-throughout-range' : 'onset-throughout-range',
        searchedFrom: Math.min(startDepth, limitDepth),
        searchedTo: Math.max(startDepth, limitDepth),
        message: startedQuiet
          ? `No ${search.modeName} between ${from} m and ${to} m: no bound in this range.`
          : `${capitalise(search.modeName)} throughout ${from}–${to} m: no quiet depth on this side in the range.`,
      } as const);
    }
    const logFactor = Math.log(Math.min(10, Math.max(1.25, Math.exp(Math.abs(value) / power) * 1.05)));
    const next = direction > 0 ? Math.min(xLimit, x + logFactor) : Math.max(xLimit, x - logFactor);
    const nextValue = G(next);
    if ((nextValue >= 0) !== (value >= 0)) {
      const root = findRootBrent(G, Math.min(x, next), Math.max(x, next), { tolerance: search.tolerance ?? DEPTH_TOLERANCE });
      return Object.freeze({ found: true, depth: Math.exp(root.root) } as const);
    }
    // Secant in (ln d, ln λ): the power measured over this step sizes the next one (a Marangoni
    // margin falls as d^-1 where the buoyancy guess of d^-3 would take three times as many steps).
    // Only a step that moved toward the crossing with both values unclamped is used.
    const slope = Math.abs((nextValue - value) / (next - x));
    const unclamped = Math.abs(value) < LOG_CAP && Math.abs(nextValue) < LOG_CAP;
    power = unclamped && Math.abs(nextValue) < Math.abs(value) && Number.isFinite(slope) ? Math.min(6, Math.max(0.5, slope)) : stepPower;
    x = next;
    value = nextValue;
  }
  throw new RangeError('depth search did not finish within 200 steps');
}

function fmt(value: number): string {
  return Number(value.toPrecision(3)).toString();
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
