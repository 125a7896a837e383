import { describe, expect, it } from 'vitest';
import { integrateAdaptive } from './integrate-adaptive';
import { denseOutputAt } from './dense-output-at';

// Exact solutions used below are textbook closed forms (no code under test involved):
// y' = −λy → y = y0·e^(−λt); x'' = −ω²x → x = cos ωt, energy E = (v² + ω²x²)/2 constant.
// Tolerance semantics: Hairer, Nørsett & Wanner (1993) Solving ODEs I, §II.4 — the local error per
// step is held below atol + rtol·|y|; the global error stays within a small multiple of it for
// these non-stiff problems, so each check allows 10× the requested tolerance.

describe('integrateAdaptive (Dormand–Prince 5(4))', () => {
  it('integrates exponential decay to the requested tolerance', () => {
    for (const rtol of [1e-4, 1e-7, 1e-10]) {
      const sol = integrateAdaptive((_t, y) => [-2 * y[0]], 0, [3], 5, { rtol, atol: rtol * 1e-3 });
      const exact = 3 * Math.exp(-10);
      expect(sol.status).toBe('completed');
      expect(sol.tFinal).toBe(5);
      expect(Math.abs(sol.yFinal[0] - exact)).toBeLessThan(10 * (rtol * exact + rtol * 1e-3));
    }
  });

  it('uses fewer steps at looser tolerance (adaptive step control)', () => {
    const loose = integrateAdaptive((_t, y) => [-y[0]], 0, [1], 10, { rtol: 1e-3, atol: 1e-6 });
    const tight = integrateAdaptive((_t, y) => [-y[0]], 0, [1], 10, { rtol: 1e-10, atol: 1e-13 });
    expect(tight.stats.accepted).toBeGreaterThan(3 * loose.stats.accepted);
    // 5th-order method: steps grow like tol^(−1/5); 10^7 in tol → ≈ 25× more steps, not 10^7.
    expect(tight.stats.accepted).toBeLessThan(100 * loose.stats.accepted);
  });

  it('conserves harmonic-oscillator energy and phase over 10 periods', () => {
    const omega = 2;
    const rtol = 1e-9;
    const tEnd = 10 * (2 * Math.PI) / omega;
    const sol = integrateAdaptive((_t, y) => [y[1], -omega * omega * y[0]], 0, [1, 0], tEnd, { rtol, atol: 1e-12 });
    const [x, v] = sol.yFinal;
    const energy = 0.5 * (v * v + omega * omega * x * x);
    const exactEnergy = 0.5 * omega * omega; // x0 = 1, v0 = 0
    expect(Math.abs(energy - exactEnergy) / exactEnergy).toBeLessThan(1e-6);
    expect(Math.abs(x - Math.cos(omega * tEnd))).toBeLessThan(1e-6);
  });

  it('dense output matches the exact solution between steps', () => {
    const times = Array.from({ length: 41 }, (_, i) => i * 0.25);
    const sol = integrateAdaptive((_t, y) => [y[1], -y[0]], 0, [0, 1], 10, { rtol: 1e-8, atol: 1e-10, outputTimes: times });
    expect(sol.outputTimes).toEqual(times);
    sol.outputStates.forEach((y, i) => {
      expect(Math.abs(y[0] - Math.sin(times[i]))).toBeLessThan(1e-6);
      expect(Math.abs(y[1] - Math.cos(times[i]))).toBeLessThan(1e-6);
    });
    // Most samples fall strictly between accepted steps, so they really come from the interpolant.
    const between = times.filter((t) => !sol.stepTimes.includes(t));
    expect(between.length).toBeGreaterThan(30);
  });

  it('locates a threshold crossing (event) on the dense output', () => {
    // y = e^(−t) falls below 0.1 at t = ln 10 exactly.
    const sol = integrateAdaptive((_t, y) => [-y[0]], 0, [1], 5, {
      rtol: 1e-9,
      atol: 1e-12,
      events: [{ name: 'below-0.1', g: (_t, y) => y[0] - 0.1, direction: 'falling' }],
    });
    expect(sol.events).toHaveLength(1);
    expect(sol.events[0].direction).toBe('falling');
    expect(Math.abs(sol.events[0].t - Math.log(10))).toBeLessThan(1e-7);
    expect(sol.status).toBe('completed');
  });

  it('stops at a terminal event and reports every zero of sin t by direction', () => {
    const sol = integrateAdaptive((_t, y) => [y[1], -y[0]], 0, [0, 1], 20, {
      rtol: 1e-10,
      atol: 1e-12,
      events: [
        { name: 'down', g: (_t, y) => y[0], direction: 'falling' },
        { name: 'stop', g: (t) => t - 7, terminal: true, direction: 'rising' },
      ],
    });
    const downs = sol.events.filter((e) => e.name === 'down').map((e) => e.t);
    expect(downs).toHaveLength(1); // sin t falls through 0 at π only, before t = 7
    expect(Math.abs(downs[0] - Math.PI)).toBeLessThan(1e-8);
    expect(sol.status).toBe('terminated-by-event');
    expect(Math.abs(sol.tFinal - 7)).toBeLessThan(1e-9);
    expect(Math.abs(sol.yFinal[0] - Math.sin(7))).toBeLessThan(1e-7);
  });

  it('respects maxStep and reports an exhausted step budget', () => {
    const capped = integrateAdaptive((_t, y) => [-y[0]], 0, [1], 1, { maxStep: 0.01 });
    expect(capped.stats.accepted).toBeGreaterThanOrEqual(100);
    for (let i = 1; i < capped.stepTimes.length; i++) {
      expect(capped.stepTimes[i] - capped.stepTimes[i - 1]).toBeLessThanOrEqual(0.01 * (1 + 1e-9));
    }
    const starved = integrateAdaptive((_t, y) => [-y[0]], 0, [1], 100, { maxStep: 0.01, maxSteps: 50 });
    expect(starved.status).toBe('step-budget-exhausted');
    expect(starved.tFinal).toBeLessThan(100);
  });

  it('rejects bad input with errors naming the field', () => {
    expect(() => integrateAdaptive((_t, y) => [-y[0]], 1, [1], 0)).toThrow(/tEnd must be > t0/);
    expect(() => integrateAdaptive((_t, y) => [-y[0]], 0, [1], 1, { rtol: 0 })).toThrow(/rtol/);
    expect(() => integrateAdaptive((_t, y) => [-y[0]], 0, [1], 1, { atol: [1, 2] })).toThrow(/atol/);
    expect(() => integrateAdaptive(() => [Number.NaN], 0, [1], 1)).toThrow(/not finite/);
    expect(() => integrateAdaptive((_t, y) => [-y[0]], 0, [1], 1, { outputTimes: [2] })).toThrow(/outputTimes/);
  });
});

describe('denseOutputAt', () => {
  it('reads the dense output anywhere in the span (exact: e^−t)', () => {
    const sol = integrateAdaptive((_t, y) => [-y[0]], 0, [1], 3, { rtol: 1e-9, atol: 1e-12, dense: true });
    for (const t of [0, 0.123, 1, 1.7, 2.999, 3]) {
      expect(Math.abs(denseOutputAt(sol.dense, t)[0] - Math.exp(-t))).toBeLessThan(1e-8);
    }
    expect(() => denseOutputAt(sol.dense, 3.5)).toThrow(/t must lie/);
  });
});
