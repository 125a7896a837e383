/**
 * The evaluation memo (server/features/layer-checks/evaluation-memo.ts) must never change an answer:
 * a remembered evaluation equals a fresh solve of the same input, different inputs never share an
 * entry, and the memo stays bounded.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateLayerCheck } from '../../shared/fluids/evaluate-layer-check';
import { readFluidInput } from '../../shared/fluids/read-fluid-input';
import { fluidInputSchema } from '../../shared/schemas/fluids';
import { evaluateLayerCheckInputSchema } from '../../shared/schemas/layer-checks';
import { demoFluidInputs } from '../../scripts/lib/seed/demo-fluids';
import { createEvaluationMemo, evaluationKey } from '../../server/features/layer-checks/evaluation-memo';

function lawsOf(index: number) {
  const read = readFluidInput(fluidInputSchema.parse(demoFluidInputs()[index]));
  if (!read.ok) throw new Error('demo fluid does not read');
  return read.fluid.laws;
}

function check(depthMicrons: number, deltaTKelvin: number, top: 'surface' | 'rigid' | 'free') {
  return evaluateLayerCheckInputSchema.parse({
    fluidId: '00000000-0000-4000-8000-000000000001',
    processKind: 'drying-coat',
    temperature: '40 °C',
    depth: `${depthMicrons} µm`,
    bottom: { mechanics: 'rigid', thermal: 'conducting' },
    top,
    heating: { mode: 'deltaT', deltaT: `${deltaTKelvin} K` },
  });
}

describe('evaluation memo', () => {
  it('answers exactly what a fresh solve answers, for remembered and new inputs alike', () => {
    const memo = createEvaluationMemo<ReturnType<typeof evaluateLayerCheck>>(8);
    const laws = [lawsOf(0), lawsOf(1)];
    fc.assert(
      fc.property(
        fc.integer({ min: 20, max: 2000 }),
        fc.constantFrom(0.5, 2, 10),
        fc.constantFrom('surface', 'rigid', 'free') as fc.Arbitrary<'surface' | 'rigid' | 'free'>,
        fc.integer({ min: 0, max: 1 }),
        (depth, deltaT, top, fluid) => {
          const input = check(depth, deltaT, top);
          const fresh = evaluateLayerCheck(input, laws[fluid], { archived: false });
          const first = memo.remember(input, laws[fluid], false, () => evaluateLayerCheck(input, laws[fluid], { archived: false }));
          const again = memo.remember(input, laws[fluid], false, () => {
            throw new Error('a repeated input must be answered from the memo');
          });
          expect(JSON.stringify(first)).toBe(JSON.stringify(fresh));
          expect(again).toBe(first);
        },
      ),
      { numRuns: 25, seed: 8 },
    );
    expect(memo.size).toBeLessThanOrEqual(8);
  });

  it('keys on every input: another depth, fluid or archived flag is another entry; key order is not', () => {
    const laws = lawsOf(0);
    const base = check(50, 2, 'surface');
    expect(evaluationKey(base, laws, false)).not.toBe(evaluationKey(check(50.001, 2, 'surface'), laws, false));
    expect(evaluationKey(base, laws, false)).not.toBe(evaluationKey(base, lawsOf(1), false));
    expect(evaluationKey(base, laws, false)).not.toBe(evaluationKey(base, laws, true));
    expect(evaluationKey(base, { ...laws, surfaceTensionSlope: laws.surfaceTensionSlope * 1.0000001 }, false)).not.toBe(evaluationKey(base, laws, false));
    const reordered = Object.fromEntries(Object.entries(base).reverse());
    expect(evaluationKey(reordered, laws, false)).toBe(evaluationKey(base, laws, false));
  });

  it('drops the least recently used entry past its bound', () => {
    const memo = createEvaluationMemo<number>(2);
    const laws = lawsOf(0);
    let solves = 0;
    const solve = () => ++solves;
    memo.remember({ a: 1 }, laws, false, solve);
    memo.remember({ a: 2 }, laws, false, solve);
    memo.remember({ a: 1 }, laws, false, solve); // touch 1: now 2 is the oldest
    memo.remember({ a: 3 }, laws, false, solve); // evicts 2
    expect(solves).toBe(3);
    memo.remember({ a: 1 }, laws, false, solve);
    expect(solves).toBe(3);
    memo.remember({ a: 2 }, laws, false, solve);
    expect(solves).toBe(4);
    expect(memo.size).toBe(2);
  });
});
