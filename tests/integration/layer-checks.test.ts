import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { evaluateLayer } from '../../shared/physics/sizing/evaluate-layer';
import { STANDARD_GRAVITY } from '../../shared/units/constants';
import { roleValues, type Role } from '../../shared/schemas/roles';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';
import { roundFluid as roundFluidFields } from './helpers/round-fluid';

let ctx: TestContext;
const agents = new Map<Role, TestAgent>();
let fluidId: string;

/**
 * A made-up fluid with round numbers: μ = 10 mPa·s, k = 0.1 W/(m·K), ρ = 1000 kg/m³,
 * c_p = 1000 J/(kg·K) → κ = 1e-7 m²/s; dσ/dT = −0.1 mN/(m·K); β = 0 (no buoyancy).
 * For d = 1 mm: Ma = 1e-4·ΔT·1e-3/(1e-2·1e-7) = 100·ΔT (hand calculation).
 */
const roundFluid = { name: 'Round-number fluid', ...roundFluidFields };

const engineer = () => agents.get('engineer') as TestAgent;

beforeAll(async () => {
  ctx = createTestContext();
  for (const role of roleValues) agents.set(role, await signedInAgent(ctx.app, await createTestUser(ctx.db, { role })));
  const created = await engineer().post('/api/fluids').send({ ...roundFluid, name: `Round-number fluid ${Date.now()}` });
  expect(created.status).toBe(201);
  fluidId = created.body.id;
});
afterAll(async () => {
  await ctx.close();
});

/** A check set up at Pearson's onset: Ma = 100·ΔT = 79.607 with ΔT = 0.79607 K, flat surface, Bi = 0. */
function pearsonCheck(overrides: Record<string, unknown> = {}) {
  return {
    title: 'Pearson onset',
    fluidId,
    processKind: 'general-layer',
    temperature: '20 °C',
    depth: '1 mm',
    bottom: { mechanics: 'rigid', thermal: 'conducting' },
    top: 'surface',
    deformableSurface: false,
    heating: { mode: 'deltaT', deltaT: '0.79607 K' },
    ...overrides,
  };
}

describe('layer check evaluation', () => {
  it("gives margin ≈ 1 at Pearson's onset (Pearson 1958, J. Fluid Mech. 4:489, Ma_c = 79.607, k_c = 1.993)", async () => {
    const res = await engineer().post('/api/layer-checks/evaluate').send(pearsonCheck());
    expect(res.status).toBe(200);
    expect(res.body.groups.marangoni).toBeCloseTo(79.607, 6); // hand calculation above
    expect(res.body.margin).toBeCloseTo(1, 3);
    expect(res.body.critical.marangoniAlone).toBeCloseTo(79.607, 1);
    expect(res.body.critical.wavenumber).toBeCloseTo(1.993, 2);
    // wavelength 2πd/k_c ≈ 3.15 d (REFERENCES.md, Pearson)
    expect(res.body.cells.wavelength / 1e-3).toBeCloseTo((2 * Math.PI) / 1.993, 2);
    expect(res.body.mechanismSentence).toMatch(/surface tension drives the cells/);
    expect(res.body.closingLine).toMatch(/not a safety design tool/);
  });

  it('is quiet at half the onset ΔT: margin ≈ 2 (the margin scales as 1/ΔT), with the levers to the 1.25 threshold', async () => {
    const res = await engineer().post('/api/layer-checks/evaluate').send(pearsonCheck({ heating: { mode: 'deltaT', deltaT: '0.398035 K' } }));
    expect(res.body.margin).toBeCloseTo(2, 3);
    expect(res.body.status).toBe('quiet');
    expect(res.body.regime).toBe('quiet');
    const dT = res.body.levers.find((l: { lever: string }) => l.lever === 'temperature-difference');
    expect(dT.target).toBeCloseTo(0.79607 / 1.25, 3);
    const mu = res.body.levers.find((l: { lever: string }) => l.lever === 'viscosity');
    expect(mu.factor).toBeCloseTo(1.25 / 2, 3);
    // Pure Marangoni at fixed ΔT: margin ∝ 1/d, so the depth may rise ×2/1.25
    const depth = res.body.levers.find((l: { lever: string }) => l.lever === 'wet-thickness');
    expect(depth.factor).toBeCloseTo(2 / 1.25, 2);
    expect(res.body.sizing.maxDeltaT).toBeCloseTo(0.79607, 3);
  });

  it('matches the physics core for the same inputs (Nield layer with buoyancy, free deformable surface, h given)', async () => {
    const body = pearsonCheck({
      fluidId: undefined,
      fluid: { ...roundFluid, expansion: { value: '0.001 1/K' } },
      depth: '4 mm',
      deformableSurface: true,
      heating: { mode: 'deltaT', deltaT: '0.1 K', heatTransferCoefficient: '5 W/(m²·K)' },
    });
    const res = await engineer().post('/api/layer-checks/evaluate').send(body);
    expect(res.status).toBe(200);
    const physics = evaluateLayer({
      bottom: 'rigid', bottomThermal: 'conducting', top: 'surface',
      density: 1000, viscosity: 0.01, conductivity: 0.1, heatCapacity: 1000, expansion: 0.001,
      surfaceTension: 0.03, dSigmaDT: -1e-4, depth: 4e-3, deltaT: 0.1, heatTransfer: 5, gravity: STANDARD_GRAVITY,
    });
    expect(res.body.margin).toBeCloseTo(physics.margin, 10);
    expect(res.body.groups.rayleigh).toBeCloseTo(physics.groups.rayleigh, 8);
    expect(res.body.groups.biot).toBeCloseTo(0.2, 12); // h d / k = 5·0.004/0.1
    expect(res.body.regime).toBe(physics.regime);
    expect(res.body.sizing.maxStableDepth).toBeCloseTo((physics.maxStableDepth as { depth: number }).depth, 10);
    // thicker than √(σ/(ρg)) = √(0.03/(1000·9.80665)) ≈ 1.75 mm
    expect(res.body.groups.capillaryLength).toBeCloseTo(Math.sqrt(0.03 / (1000 * 9.80665)), 12);
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toContain('thicker-than-capillary-length');
  });

  it('gives lateral-flow speeds τd/μ and τd/(4μ) (Smith & Davis 1983, J. Fluid Mech. 132:119)', async () => {
    const res = await engineer()
      .post('/api/layer-checks/evaluate')
      .send(pearsonCheck({ lateral: { deltaT: '10 K', distance: '1 cm' } }));
    // τ = 1e-4·10/0.01 = 0.1 Pa; τd/μ = 0.1·1e-3/0.01 = 0.01 m/s; closed: 0.0025 m/s
    expect(res.body.lateralFlow.surfaceStress).toBeCloseTo(0.1, 12);
    expect(res.body.lateralFlow.openLayerSpeed).toBeCloseTo(0.01, 12);
    expect(res.body.lateralFlow.closedLayerSpeed).toBeCloseTo(0.0025, 12);
    expect(res.body.lateralFlow.direction).toBe('toward-cooler');
  });

  it('warns when the temperature is outside the fluid range and names defects for an over-margin drying coat', async () => {
    const res = await engineer()
      .post('/api/layer-checks/evaluate')
      .send(pearsonCheck({ processKind: 'drying-coat', temperature: '40 °C', heating: { mode: 'deltaT', deltaT: '2 K' }, panelWidth: '1 m' }));
    expect(res.body.status).toBe('over');
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toContain('temperature-outside-range');
    expect(res.body.defects.map((d: { name: string }) => d.name)).toContain('Bénard cells / floating');
    expect(res.body.cautions.join(' ')).toMatch(/25 % of the lower flammable limit/);
    expect(res.body.cells.acrossPanel).toBeCloseTo(1 / res.body.cells.wavelength, 6);
  });

  it('rejects bad units and out-of-range values with 422 naming the field', async () => {
    const bad = await engineer().post('/api/layer-checks/evaluate').send(pearsonCheck({ depth: '12 furlongs' }));
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields).toHaveProperty('depth');
    const negative = await engineer().post('/api/layer-checks/evaluate').send(pearsonCheck({ depth: '-3 mm' }));
    expect(negative.status).toBe(422);
    expect(negative.body.error.fields.depth).toMatch(/> 0/);
    const wrongKind = await engineer().post('/api/layer-checks/evaluate').send(pearsonCheck({ heating: { mode: 'deltaT', deltaT: '5 mPa·s' } }));
    expect(wrongKind.status).toBe(422);
    expect(wrongKind.body.error.fields).toHaveProperty('heating.deltaT');
    const noFluid = await engineer().post('/api/layer-checks/evaluate').send(pearsonCheck({ fluidId: '00000000-0000-4000-8000-000000000000' }));
    expect(noFluid.status).toBe(422);
    expect(noFluid.body.error.fields).toHaveProperty('fluidId');
  });

  it('lets every signed-in role evaluate, nobody without a session', async () => {
    for (const role of roleValues) {
      expect((await (agents.get(role) as TestAgent).post('/api/layer-checks/evaluate').send(pearsonCheck())).status).toBe(200);
    }
    const { default: request } = await import('supertest');
    expect((await request(ctx.app).post('/api/layer-checks/evaluate').send(pearsonCheck())).status).toBe(401);
  });
});

describe('layer checks: create, revise, conflict, permissions', () => {
  it('creates revision 1, makes a new revision on a changed save, none on an unchanged one', async () => {
    const created = await engineer().post('/api/layer-checks').send(pearsonCheck({ title: `Line 2 primer ${Date.now()}` }));
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ revision: 1, version: 1, depth: '1 mm' });
    expect(created.body.savedMargin).toBeCloseTo(1, 3);
    const { id } = created.body;
    const { id: _id, fluidName: _f, fluidArchived: _a, ownerId: _o, ownerName: _n, revision: _r, version: _v, savedMargin: _m, savedRegime: _g, createdAt: _c, updatedAt: _u, ...input } = created.body;

    const same = await engineer().put(`/api/layer-checks/${id}`).send({ ...input, version: 1 });
    expect(same.status).toBe(200);
    expect(same.body.revision).toBe(1);

    const changed = await engineer().put(`/api/layer-checks/${id}`).send({ ...input, depth: '0.5 mm', version: 1 });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ revision: 2, version: 2, depth: '0.5 mm' });
    expect(changed.body.savedMargin).toBeCloseTo(2, 3); // Ma ∝ d at fixed ΔT

    const stale = await engineer().put(`/api/layer-checks/${id}`).send({ ...input, depth: '2 mm', version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.current).toMatchObject({ version: 2, revision: 2, depth: '0.5 mm' });

    const revisions = await engineer().get(`/api/layer-checks/${id}/revisions`);
    expect(revisions.body.items.map((r: { revision: number }) => r.revision)).toEqual([2, 1]);
    expect(revisions.body.items[1].input.depth).toBe('1 mm');
  });

  it('lets technicians and reviewers read checks but not create or edit them', async () => {
    const created = (await engineer().post('/api/layer-checks').send(pearsonCheck({ title: `Read-only ${Date.now()}` }))).body;
    for (const role of ['technician', 'reviewer', 'administrator'] as const) {
      const agent = agents.get(role) as TestAgent;
      expect((await agent.get(`/api/layer-checks/${created.id}`)).status).toBe(200);
      expect((await agent.get('/api/layer-checks')).status).toBe(200);
      expect((await agent.post('/api/layer-checks').send(pearsonCheck())).status).toBe(403);
      expect((await agent.put(`/api/layer-checks/${created.id}`).send({ ...pearsonCheck(), version: 1 })).status).toBe(403);
    }
  });

  it('lists with paging, filter and sort by saved margin', async () => {
    const tag = `zz-list-${Date.now()}`;
    for (const [n, d] of [['a', '1 mm'], ['b', '0.25 mm'], ['c', '0.5 mm']] as const) {
      expect((await engineer().post('/api/layer-checks').send(pearsonCheck({ title: `${tag}-${n}`, depth: d }))).status).toBe(201);
    }
    const res = await engineer().get('/api/layer-checks').query({ q: tag, sort: 'margin', dir: 'asc', pageSize: 2 });
    expect(res.body.total).toBe(3);
    expect(res.body.items.map((c: { title: string }) => c.title)).toEqual([`${tag}-a`, `${tag}-c`]);
  });

  it('lists only one owner\'s checks with ownerId, and refuses an ownerId that is not a user id', async () => {
    const tag = `zz-owner-${Date.now()}`;
    const ann = await createTestUser(ctx.db, { role: 'engineer', label: 'ann' });
    const ben = await createTestUser(ctx.db, { role: 'engineer', label: 'ben' });
    const annAgent = await signedInAgent(ctx.app, ann);
    const benAgent = await signedInAgent(ctx.app, ben);
    expect((await annAgent.post('/api/layer-checks').send(pearsonCheck({ title: `${tag}-ann-1` }))).status).toBe(201);
    expect((await annAgent.post('/api/layer-checks').send(pearsonCheck({ title: `${tag}-ann-2` }))).status).toBe(201);
    expect((await benAgent.post('/api/layer-checks').send(pearsonCheck({ title: `${tag}-ben-1` }))).status).toBe(201);

    const all = await engineer().get('/api/layer-checks').query({ q: tag, sort: 'title', dir: 'asc' });
    expect(all.body.total).toBe(3);
    const anns = await benAgent.get('/api/layer-checks').query({ q: tag, ownerId: ann.id, sort: 'title', dir: 'asc' });
    expect(anns.status).toBe(200);
    expect(anns.body.total).toBe(2);
    expect(anns.body.items.map((c: { title: string; ownerName: string }) => [c.title, c.ownerName])).toEqual([
      [`${tag}-ann-1`, ann.displayName],
      [`${tag}-ann-2`, ann.displayName],
    ]);
    const nobody = await engineer().get('/api/layer-checks').query({ q: tag, ownerId: '00000000-0000-4000-8000-000000000000' });
    expect(nobody.status).toBe(200);
    expect(nobody.body.total).toBe(0);

    const bad = await engineer().get('/api/layer-checks').query({ ownerId: 'me' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.ownerId).toMatch(/user id/);
  });

  it('draws the quiet window of a saved check with its boundary at Pearson onset', async () => {
    const created = (await engineer().post('/api/layer-checks').send(pearsonCheck({ title: `Window ${Date.now()}` }))).body;
    const res = await engineer().get(`/api/layer-checks/${created.id}/window`).query({ points: 10, depthMin: '0.5 mm', depthMax: '2 mm', driveMax: '2 K' });
    expect(res.status).toBe(200);
    expect(res.body.driveKind).toBe('deltaT');
    expect(res.body.depths).toHaveLength(10);
    // Ma_c = 79.607 = 100·ΔT·(d/1 mm) → ΔT_onset(d) = 0.79607 K·(1 mm/d) (Pearson 1958)
    res.body.depths.forEach((d: number, j: number) => {
      expect(res.body.cellBoundary[j]).toBeCloseTo(0.79607e-3 / d, 2);
    });
    expect(res.body.operatingPoint).toEqual({ depth: 1e-3, drive: expect.closeTo(0.79607, 9) });
  });
});
