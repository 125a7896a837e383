import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { evaluateCase } from '../../shared/physics/batch/evaluate-case';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';

let ctx: TestContext;
let engineer: TestAgent;
let technician: TestAgent;
beforeAll(async () => {
  ctx = createTestContext();
  engineer = await signedInAgent(ctx.app, await createTestUser(ctx.db, { role: 'engineer' }));
  technician = await signedInAgent(ctx.app, await createTestUser(ctx.db, { role: 'technician' }));
});
afterAll(async () => {
  await ctx.close();
});

const pearson = (id: string, marangoni: number) => ({ id, bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', marangoni, biot: 0 });

describe('POST /api/batch/evaluate', () => {
  it("answers a bare array with the onset command's results; Pearson's Ma_c = 79.607 gives margin ≈ 1 (Pearson 1958)", async () => {
    const cases = [pearson('p1', 79.607), pearson('p2', 39.8035), { id: 'bad', bottom: 'rigid', bottomThermal: 'conducting', top: 'surface', marangoni: 'lots' }];
    const res = await engineer.post('/api/batch/evaluate').send(cases);
    expect(res.status).toBe(200);
    expect(res.body).toHaveLength(3);
    expect(res.body[0].margin).toBeCloseTo(1, 3);
    expect(res.body[1].margin).toBeCloseTo(2, 3);
    expect(res.body[2].error).toMatch(/marangoni/);
    // the same shared row evaluation as the onset command
    expect(res.body).toEqual(JSON.parse(JSON.stringify(cases.map((c) => evaluateCase(c)))));
  });

  it('runs a large batch in a worker thread and keeps order; { cases } gets { results }', async () => {
    const cases = Array.from({ length: 120 }, (_, i) => pearson(`c${i}`, 79.607 / (1 + i / 10)));
    const res = await engineer.post('/api/batch/evaluate').send({ cases });
    expect(res.status).toBe(200);
    expect(res.body.results).toHaveLength(120);
    res.body.results.forEach((r: { id: string; margin: number }, i: number) => {
      expect(r.id).toBe(`c${i}`);
      expect(r.margin).toBeCloseTo(1 + i / 10, 3);
    });
  });

  it('refuses more than 10,000 cases with a clear 413', async () => {
    const res = await engineer.post('/api/batch/evaluate').send(Array.from({ length: 10_001 }, () => ({})));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
    expect(res.body.error.message).toMatch(/at most 10,000/);
  });

  it('is for engineers only', async () => {
    expect((await technician.post('/api/batch/evaluate').send([pearson('x', 10)])).status).toBe(403);
  });
});
