import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { onsetMargin } from './onset-margin';
import type { StabilityProblem } from './types';

// Property-based checks of the Onset margin. Seeds are fixed so a failure reproduces.
const boundaries = fc.record({
  bottom: fc.constantFrom('rigid' as const, 'free' as const),
  bottomThermal: fc.constantFrom('conducting' as const, 'insulating' as const),
  top: fc.constantFrom('rigid' as const, 'free' as const, 'surface' as const),
  biot: fc.oneof(fc.double({ min: 0, max: 50, noNaN: true }), fc.constant(Infinity)),
});
/** A drive of practical size: 0 or 1e-3 ≤ |x| ≤ max (relations are checked here). */
const drive = (max: number) =>
  fc.oneof(fc.constant(0), fc.tuple(fc.double({ min: 1e-3, max, noNaN: true }), fc.boolean()).map(([v, negative]) => (negative ? -v : v)));
/** Any finite double, down to sub-normal and up to 1e308 (only "no NaN, no exception" is checked). */
const anyFinite = fc.double({ noNaN: true, noDefaultInfinity: true });
const flatProblem = fc
  .tuple(boundaries, drive(3000), drive(300))
  .map(([b, rayleigh, marangoni]): StabilityProblem => ({ ...b, rayleigh, marangoni }));
const deformableProblem = fc
  .tuple(
    flatProblem,
    fc.double({ min: 1e-8, max: 0.1, noNaN: true }),
    fc.double({ min: 0, max: 5, noNaN: true }),
  )
  .map(([p, crispation, bond]): StabilityProblem => ({ ...p, top: 'surface', crispation, bond }));
const anyProblem = fc.oneof(flatProblem, deformableProblem);
const extremeProblem = fc
  .tuple(boundaries, anyFinite, anyFinite, fc.double({ min: 0, max: 1e6, noNaN: true }), fc.double({ min: 0, max: 1e6, noNaN: true }), fc.boolean())
  .map(([b, rayleigh, marangoni, crispation, bond, deformable]): StabilityProblem =>
    deformable ? { ...b, top: 'surface', rayleigh, marangoni, crispation, bond } : { ...b, rayleigh, marangoni },
  );

const close = (a: number, b: number, tolerance: number) =>
  (a === Infinity && b === Infinity) || Math.abs(a - b) <= tolerance * Math.max(Math.abs(a), Math.abs(b));

describe('onsetMargin properties', () => {
  it('scales as 1/ΔT: multiplying Ra and Ma by s divides the margin by s (Ra, Ma ∝ ΔT by their definitions)', () => {
    fc.assert(
      fc.property(anyProblem, fc.double({ min: 0.1, max: 10, noNaN: true }), (problem, s) => {
        const base = onsetMargin(problem);
        const scaled = onsetMargin({ ...problem, rayleigh: problem.rayleigh * s, marangoni: problem.marangoni * s });
        expect(close(scaled.margin, base.margin / s, 1e-5)).toBe(true);
      }),
      { numRuns: 40, seed: 20240611 },
    );
  });

  it('is continuous in the Biot number: a change of 1e-4 moves the margin by less than 2 %', () => {
    fc.assert(
      fc.property(flatProblem, fc.double({ min: 0, max: 20, noNaN: true }), (problem, biot) => {
        const a = onsetMargin({ ...problem, biot });
        const b = onsetMargin({ ...problem, biot: biot + 1e-4 });
        if (a.margin === Infinity || b.margin === Infinity) {
          expect(a.margin).toBe(b.margin);
          return;
        }
        // Near Bi = 0 with an insulating bottom the margin varies like √Bi, hence the loose bound.
        expect(Math.abs(a.margin - b.margin)).toBeLessThanOrEqual(0.02 * a.margin);
      }),
      { numRuns: 40, seed: 7 },
    );
  });

  it('never returns NaN where a number is defined, nor throws, for any finite input (sub-normal to 1e308)', () => {
    fc.assert(
      fc.property(extremeProblem, (problem) => {
        const r = onsetMargin(problem);
        for (const value of [r.margin, r.cellMargin, r.longWaveMargin, r.onsetRayleigh, r.onsetMarangoni]) expect(Number.isNaN(value)).toBe(false);
        expect(r.margin).toBeGreaterThanOrEqual(0);
        if (Number.isFinite(r.margin)) {
          expect(Number.isNaN(r.criticalWavenumber)).toBe(false);
          expect(r.buoyancyShare).toBeGreaterThanOrEqual(0);
          expect(r.buoyancyShare).toBeLessThanOrEqual(1);
        }
      }),
      { numRuns: 60, seed: 11 },
    );
  });

  it('keeps its fields consistent for drives of practical size', () => {
    fc.assert(
      fc.property(anyProblem, (problem) => {
        const r = onsetMargin(problem);
        expect(r.margin).toBeGreaterThanOrEqual(0);
        expect(r.cellMargin).toBeGreaterThanOrEqual(0);
        expect(r.longWaveMargin).toBeGreaterThanOrEqual(0);
        expect(Number.isNaN(r.onsetRayleigh)).toBe(false);
        expect(Number.isNaN(r.onsetMarangoni)).toBe(false);
        // the deformable problem includes the flat cellular modes (to the 1e-4 of the k → 0 extrapolation)
        expect(r.margin).toBeLessThanOrEqual(r.cellMargin * (1 + 1e-4));
        if (Number.isFinite(r.margin)) {
          expect(r.criticalWavenumber).toBeGreaterThanOrEqual(0);
          expect(r.buoyancyShare).toBeGreaterThanOrEqual(0);
          expect(r.buoyancyShare).toBeLessThanOrEqual(1);
          expect(r.mechanism).not.toBe('none');
        } else {
          expect(r.mechanism).toBe('none');
          expect(r.regime).toBe('quiet');
        }
        expect(r.regime === 'quiet').toBe(r.margin >= 1);
      }),
      { numRuns: 80, seed: 42 },
    );
  });

  it('rejects any non-finite drive or deformable-surface number with a RangeError naming the field', () => {
    const nonFinite = fc.constantFrom(Number.NaN, Infinity, -Infinity);
    const field = fc.constantFrom('rayleigh', 'marangoni', 'crispation', 'bond');
    fc.assert(
      fc.property(deformableProblem, field, nonFinite, (problem, name, value) => {
        expect(() => onsetMargin({ ...problem, [name]: value })).toThrow(RangeError);
        expect(() => onsetMargin({ ...problem, [name]: value })).toThrow(new RegExp(name));
      }),
      { numRuns: 30, seed: 3 },
    );
    expect(() => onsetMargin({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: Number.NaN, rayleigh: 1, marangoni: 1 })).toThrow(/biot/);
    expect(() => onsetMargin({ bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', biot: -Infinity, rayleigh: 1, marangoni: 1 })).toThrow(/biot/);
  });
});
