/**
 * A bounded memo of layer evaluations, so a repeated question is answered without solving it again.
 *
 * `evaluateLayerCheck` (shared/fluids) is a pure function of the check fields, the fluid laws and the
 * archived flag: no clock, no randomness, no I/O. The key is the canonical JSON of exactly those three
 * (object keys sorted, so key order never matters), which makes a hit return the very answer a new
 * solve would give. The least recently used entry is dropped past MAX_ENTRIES.
 *
 * Cached answers are shared between requests: callers only read them (they are serialised to JSON or
 * copied into columns), never change them.
 */
import type { FluidLaws } from '../../../shared/fluids/fluid-laws';

/** Enough for every check open on a busy site at once; each answer is a few kilobytes. */
export const MAX_ENTRIES = 2_000;

function canonical(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(canonical);
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(
      Object.keys(value as Record<string, unknown>)
        .sort()
        .filter((key) => (value as Record<string, unknown>)[key] !== undefined)
        .map((key) => [key, canonical((value as Record<string, unknown>)[key])]),
    );
  }
  return value;
}

/** The memo key: canonical JSON of check, laws and archived flag. */
export function evaluationKey(check: unknown, laws: FluidLaws, archived: boolean): string {
  return JSON.stringify(canonical({ check, laws, archived }));
}

export function createEvaluationMemo<T>(maxEntries = MAX_ENTRIES) {
  const entries = new Map<string, T>();
  return {
    /** The remembered answer for this input, or `evaluate()`'s, remembered from now on. */
    remember(check: unknown, laws: FluidLaws, archived: boolean, evaluate: () => T): T {
      const key = evaluationKey(check, laws, archived);
      const hit = entries.get(key);
      if (hit !== undefined) {
        entries.delete(key);
        entries.set(key, hit); // most recently used goes last
        return hit;
      }
      const value = evaluate();
      entries.set(key, value);
      if (entries.size > maxEntries) entries.delete(entries.keys().next().value as string);
      return value;
    },
    get size() {
      return entries.size;
    },
  };
}
