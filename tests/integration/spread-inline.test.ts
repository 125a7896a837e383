import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { roleValues, type Role } from '../../shared/schemas/roles';
import { spreadSheetSection } from '../../server/features/property-spreads/spread-sheet-section';
import { latestFinishedSpreadOfRevision } from '../../server/features/property-spreads/property-spreads.service';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';

let ctx: TestContext;
const agents = new Map<Role, TestAgent>();
const engineer = () => agents.get('engineer') as TestAgent;
let checkId: string;

/**
 * Round-number fluid: μ = 10 mPa·s, k = 0.1 W/(m·K), ρ = 1000 kg/m³, c_p = 1000 J/(kg·K) → κ = 1e-7 m²/s,
 * dσ/dT = −0.1 mN/(m·K), β = 0. At d = 1 mm, Ma = 100·ΔT (hand calculation), so ΔT = 0.79607 K sits at
 * Pearson's onset Ma_c = 79.607 (Pearson 1958, J. Fluid Mech. 4:489, conducting rigid bottom, Bi = 0).
 * The fluid states ± 2 % on viscosity and ± 1 % on dσ/dT (used when a run names no uncertainties).
 */
const roundFluid = (name: string) => ({
  name,
  kind: 'other',
  referenceTemperature: '20 °C',
  density: { value: '1000 kg/m³' },
  expansion: { value: '0 1/K' },
  viscosity: { law: 'points', points: [{ temperature: '20 °C', value: '10 mPa·s' }], uncertaintyPercent: 2 },
  surfaceTension: { value: '30 mN/m' },
  surfaceTensionSlope: { value: '-0.1 mN/(m·K)', uncertaintyPercent: 1, distribution: 'uniform' },
  conductivity: { value: '0.1 W/(m·K)' },
  heatCapacity: { value: '1000 J/(kg·K)' },
});

beforeAll(async () => {
  ctx = createTestContext();
  for (const role of roleValues) agents.set(role, await signedInAgent(ctx.app, await createTestUser(ctx.db, { role })));
  const fluid = await engineer().post('/api/fluids').send(roundFluid(`Spread fluid ${Date.now()}`));
  expect(fluid.status).toBe(201);
  const created = await engineer()
    .post('/api/layer-checks')
    .send({
      title: `Pearson onset spread ${Date.now()}`,
      fluidId: fluid.body.id,
      processKind: 'general-layer',
      temperature: '20 °C',
      depth: '1 mm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      deformableSurface: false,
      heating: { mode: 'deltaT', deltaT: '0.79607 K' },
    });
  expect(created.status).toBe(201);
  checkId = created.body.id;
});
afterAll(async () => {
  await ctx.close();
});

/** ΔT uniform ± 10 %: margin = Ma_c/Ma = 1/f with f ~ U(0.9, 1.1). */
const deltaTOnly = [{ name: 'deltaT', uncertaintyPercent: 10, distribution: 'uniform' }];

describe('POST /api/layer-checks/:id/spreads (inline, ≤ 10 000 samples)', () => {
  it('matches the closed form at onset: P(onset) = ½ and margin percentiles 1/(1 ± 0.9u) for ΔT uniform ± u', async () => {
    const res = await engineer().post(`/api/layer-checks/${checkId}/spreads`).send({ samples: 8000, seed: 11, uncertainties: deltaTOnly });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: 'done', progress: 1, samples: 8000, seed: 11, revision: 1 });
    const r = res.body.result;
    // Margin < 1 ⇔ f > 1, probability ½ for f ~ U(0.9, 1.1) (derived); 8000 samples → s.e. 0.0056.
    expect(Math.abs(r.onsetProbability - 0.5)).toBeLessThan(0.03);
    expect(r.onsetInterval95[0]).toBeLessThan(0.5);
    expect(r.onsetInterval95[1]).toBeGreaterThan(0.5);
    // 5th percentile of 1/f is 1/(95th percentile of f) = 1/1.09; 95th is 1/0.91 (derived from the uniform law).
    expect(r.marginPercentiles.p5).toBeCloseTo(1 / 1.09, 2);
    expect(r.marginPercentiles.p50).toBeCloseTo(1, 2);
    expect(r.marginPercentiles.p95).toBeCloseTo(1 / 0.91, 2);
    expect(r.sensitivity[0]).toMatchObject({ name: 'deltaT', direction: 'lowers' });
    expect(r.sensitivity[0].rankCorrelation).toBeLessThan(-0.99); // margin is a falling function of ΔT alone
  });

  it('reproduces a run exactly with the same seed and differs with another seed', async () => {
    const body = { samples: 2000, seed: 424242, uncertainties: [...deltaTOnly, { name: 'viscosity', uncertaintyPercent: 5, distribution: 'normal' }] };
    const first = await engineer().post(`/api/layer-checks/${checkId}/spreads`).send(body);
    const second = await engineer().post(`/api/layer-checks/${checkId}/spreads`).send(body);
    const other = await engineer().post(`/api/layer-checks/${checkId}/spreads`).send({ ...body, seed: 424243 });
    expect(first.status).toBe(201);
    expect(second.body.id).not.toBe(first.body.id);
    expect(second.body.result).toEqual(first.body.result);
    expect(other.body.result.marginPercentiles).not.toEqual(first.body.result.marginPercentiles);
    const stored = await agents.get('technician')!.get(`/api/property-spreads/${first.body.id}`);
    expect(stored.status).toBe(200);
    expect(stored.body.result).toEqual(first.body.result);
  });

  it('uses the uncertainties stated in the fluid library when the run names none', async () => {
    const res = await engineer().post(`/api/layer-checks/${checkId}/spreads`).send({ samples: 500, seed: 3 });
    expect(res.status).toBe(201);
    expect(res.body.uncertainties).toEqual([
      { name: 'viscosity', uncertaintyPercent: 2, distribution: 'normal' },
      { name: 'dSigmaDT', uncertaintyPercent: 1, distribution: 'uniform' },
    ]);
    // Ma ∝ |dσ/dT|/μ (Pearson 1958): scaling the viscosity up raises the margin, scaling dσ/dT up (more negative,
    // a stronger drive) lowers it. Sensitivity is reported per sampled factor of the stated value.
    const byName = Object.fromEntries(res.body.result.sensitivity.map((s: { name: string; direction: string }) => [s.name, s.direction]));
    expect(byName.viscosity).toBe('raises');
    expect(byName.dSigmaDT).toBe('lowers');
  });

  it('gives the process sheet section from the stored result', async () => {
    const res = await engineer().post(`/api/layer-checks/${checkId}/spreads`).send({ samples: 1000, seed: 5, uncertainties: deltaTOnly });
    expect((await latestFinishedSpreadOfRevision(ctx.db, checkId, 1))?.id).toBe(res.body.id);
    const section = spreadSheetSection(res.body);
    expect(section.rows.find((r) => r.label.startsWith('Probability of onset'))?.value).toMatch(/95 % interval/);
    expect(section.rows.find((r) => r.label === 'Moves the margin most')?.value).toMatch(/^Temperature difference/);
  });

  it('answers 400 naming the field for bad samples, seed or uncertainties', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ seed: 1 }, 'samples'],
      [{ samples: 50, seed: 1 }, 'samples'],
      [{ samples: 2_000_000, seed: 1 }, 'samples'],
      [{ samples: 1000, seed: -1 }, 'seed'],
      [{ samples: 1000, seed: 1.5 }, 'seed'],
      [{ samples: 1000, seed: 1, uncertainties: [{ name: 'colour', uncertaintyPercent: 5 }] }, 'uncertainties.0.name'],
      [{ samples: 1000, seed: 1, uncertainties: [{ name: 'depth', uncertaintyPercent: 80 }] }, 'uncertainties.0.uncertaintyPercent'],
    ];
    for (const [body, field] of cases) {
      const res = await engineer().post(`/api/layer-checks/${checkId}/spreads`).send(body);
      expect({ field, status: res.status }).toEqual({ field, status: 400 });
      expect(res.body.error.fields).toHaveProperty([field]);
    }
  });

  it('answers 422 when a uncertainty names a property that is zero (β = 0 cannot be scaled)', async () => {
    const res = await engineer().post(`/api/layer-checks/${checkId}/spreads`).send({ samples: 1000, seed: 1, uncertainties: [{ name: 'expansion', uncertaintyPercent: 5 }] });
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toHaveProperty('base.expansion');
  });

  it('lets engineers run, everyone signed in read, and nobody without a session', async () => {
    for (const role of ['technician', 'reviewer', 'administrator'] as const) {
      expect((await agents.get(role)!.post(`/api/layer-checks/${checkId}/spreads`).send({ samples: 500, seed: 1 })).status).toBe(403);
      expect((await agents.get(role)!.get(`/api/layer-checks/${checkId}/spreads`)).status).toBe(200);
    }
    expect((await request(ctx.app).post(`/api/layer-checks/${checkId}/spreads`).send({ samples: 500, seed: 1 })).status).toBe(401);
    expect((await engineer().get('/api/property-spreads/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });

  it('stores a run above 10 000 samples as queued with progress 0 (a worker picks it up)', async () => {
    const res = await engineer().post(`/api/layer-checks/${checkId}/spreads`).send({ samples: 12_000, seed: 9, uncertainties: deltaTOnly });
    expect(res.status).toBe(202);
    expect(res.body).toMatchObject({ status: 'queued', progress: 0, result: null });
  });
});
