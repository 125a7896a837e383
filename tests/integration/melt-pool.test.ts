import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { roleValues, type Role } from '../../shared/schemas/roles';
import { meltPoolSheetSection } from '../../server/features/melt-pool/melt-pool-sheet-section';
import { latestMeltPoolSetupOfRevision } from '../../server/features/melt-pool/melt-pool.service';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';

let ctx: TestContext;
const agents = new Map<Role, TestAgent>();
const engineer = () => agents.get('engineer') as TestAgent;
let meltCheckId: string;
const tag = Date.now().toString(36);

/**
 * Pure-iron constants of Sahoo, DebRoy & McNallan (1988), Metall. Trans. B 19:483, Table: γ_m° = 1.943 N/m,
 * A = 4.3×10⁻⁴ N/(m·K), T_m = 1809 K. With no sulfur the adsorption term vanishes: γ = 1.943 − 4.3×10⁻⁴ (T − 1809).
 */
const pureIron = (t: number) => 1.943 - 4.3e-4 * (t - 1809);

/** The scales of DOMAIN §8 (derived; inputs from memory): ΔT 1000 K, L 3 mm, ρ 7000 kg/m³, μ 6 mPa·s, κ 5e-6 m²/s. */
const domainPool = {
  sulfur: '0 ppm',
  edgeTemperature: '1809 K',
  peakTemperature: '2809 K',
  halfWidth: '3 mm',
  density: '7000 kg/m³',
  viscosity: '6 mPa·s',
  thermalDiffusivity: '5e-6 m²/s',
};

beforeAll(async () => {
  ctx = createTestContext();
  for (const role of roleValues) agents.set(role, await signedInAgent(ctx.app, await createTestUser(ctx.db, { role })));
  const fluids = await engineer().get('/api/fluids').query({ q: 'Low-sulfur steel melt' });
  const fluidId = fluids.body.items[0].id;
  const check = await engineer().post('/api/layer-checks').send({
    title: `Tube-to-elbow weld ${tag}`,
    fluidId,
    processKind: 'melt-pool',
    temperature: '1850 K',
    depth: '1 mm',
    bottom: { mechanics: 'rigid', thermal: 'conducting' },
    top: 'surface',
    heating: { mode: 'deltaT', deltaT: '5 K' },
  });
  expect(check.status, JSON.stringify(check.body)).toBe(201);
  meltCheckId = check.body.id;
});
afterAll(async () => {
  await ctx.close();
});

describe('POST /api/melt-pool/evaluate', () => {
  it('gives the pure-iron line of Sahoo et al. (1988) with no sulfur, outward flow and a shallow, wide pool', async () => {
    const res = await agents.get('technician')!.post('/api/melt-pool/evaluate').send(domainPool);
    expect(res.status).toBe(200);
    expect(res.body.surfaceTensionAtEdge).toBeCloseTo(1.943, 6);
    for (const point of res.body.curve) {
      expect(point.surfaceTension).toBeCloseTo(pureIron(point.temperature), 6);
      expect(point.slope).toBeCloseTo(-4.3e-4, 8);
    }
    expect(res.body).toMatchObject({ direction: 'outward', poolShape: 'shallow-wide', signChangeTemperature: null, signChangeTemperatureWide: null });
    expect(res.body.directionText).toMatch(/shallow, wide pool/);
  });

  it('gives Ma, the velocity scale and Pe of the boundary-layer scaling (DebRoy & David 1995), of the order DOMAIN §8 quotes', async () => {
    const res = await engineer().post('/api/melt-pool/evaluate').send(domainPool);
    // Closed forms with |dσ/dT| = 4.3e-4 N/(m·K), ΔT = 1000 K, L = 3e-3 m (hand calculation):
    const tau = (4.3e-4 * 1000) / 3e-3; // 143.3 Pa
    const u = Math.cbrt((tau * tau * 3e-3) / (7000 * 6e-3)); // ≈ 1.13 m/s
    expect(res.body.surfaceStress).toBeCloseTo(tau, 6);
    expect(res.body.surfaceVelocity).toBeCloseTo(u, 6);
    expect(res.body.pecletNumber).toBeCloseTo((u * 3e-3) / 5e-6, 3);
    expect(res.body.marangoniNumber).toBeCloseTo((4.3e-4 * 1000 * 3e-3) / (6e-3 * 5e-6), 0);
    // DOMAIN §8: τ ≈ 130 Pa, u ≈ 1 m/s, Pe ≈ 500 (for 0.4 mN/(m·K)); same order here.
    expect(res.body.surfaceStress).toBeGreaterThan(100);
    expect(res.body.surfaceVelocity).toBeGreaterThan(0.5);
    expect(res.body.surfaceVelocity).toBeLessThan(2);
    expect(res.body.pecletNumber).toBeGreaterThan(200);
    expect(res.body.velocityScaling).toMatch(/DebRoy & David 1995/);
  });

  it('turns the flow inward (deep, narrow pool) above the published sulfur band, read from "120 ppm" or "0.012 wt %"', async () => {
    // Heiple & Roper (1982); Mills et al. (1998): > 60–70 ppm S gives dγ/dT > 0 near the melting point → inward flow.
    const body = { ...domainPool, peakTemperature: '1900 K', halfWidth: '2.5 mm' };
    const a = await engineer().post('/api/melt-pool/evaluate').send({ ...body, sulfur: '120 ppm' });
    const b = await engineer().post('/api/melt-pool/evaluate').send({ ...body, sulfur: '0.012 wt %' });
    expect(a.status).toBe(200);
    expect(a.body).toMatchObject({ direction: 'inward', poolShape: 'deep-narrow', sulfurPpm: expect.closeTo(120, 9) });
    expect(a.body.slopeAtEdge).toBeGreaterThan(0);
    expect(b.body.curve).toEqual(a.body.curve);
    expect(a.body.signChangeTemperatureWide).toBeGreaterThan(1900);
    expect(a.body.cautions.map((c: { id: string }) => c.id)).toEqual(expect.arrayContaining(['fume', 'radiation', 'burns', 'fire', 'not-a-safety-tool']));
    expect(a.body.cautions.find((c: { id: string }) => c.id === 'fume').text).toMatch(/hexavalent chromium/);
  });

  it('answers 400 naming the field', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ ...domainPool, sulfur: undefined }, 'sulfur'],
      [{ ...domainPool, activity: 0.01 }, 'sulfur'],
      [{ ...domainPool, sulfur: 'lots' }, 'sulfur'],
      [{ ...domainPool, peakTemperature: '1700 K' }, 'peakTemperature'],
      [{ ...domainPool, halfWidth: '3 kg' }, 'halfWidth'],
    ];
    for (const [body, field] of cases) {
      const res = await engineer().post('/api/melt-pool/evaluate').send(body);
      expect({ field, status: res.status }).toEqual({ field, status: 400 });
      expect(res.body.error.fields).toHaveProperty([field]);
    }
    expect((await request(ctx.app).post('/api/melt-pool/evaluate').send(domainPool)).status).toBe(401);
  });
});

describe('heats register and joined heats', () => {
  it('lets engineers add, change and remove heats with unit-aware sulfur; everyone reads; duplicates and stale versions are 409', async () => {
    const created = await engineer().post('/api/heats').send({ heatNumber: `T-${tag}-1`, supplier: 'Invented Mill', sulfur: '0.002 wt %', oxygen: '30 ppm' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ sulfurWtPercent: 0.002, sulfurPpm: expect.closeTo(20, 9), oxygenWtPercent: 0.003, version: 1 });
    expect((await engineer().post('/api/heats').send({ heatNumber: `t-${tag}-1`, sulfur: '20 ppm' })).status).toBe(409);
    const bad = await engineer().post('/api/heats').send({ heatNumber: `T-${tag}-x`, sulfur: '2 %% of it' });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields).toHaveProperty('sulfur');
    const tooMuch = await engineer().post('/api/heats').send({ heatNumber: `T-${tag}-y`, sulfur: '2 wt %' });
    expect(tooMuch.status).toBe(422);

    for (const role of ['technician', 'reviewer', 'administrator'] as const) {
      expect((await agents.get(role)!.post('/api/heats').send({ heatNumber: `R-${role}-${tag}`, sulfur: '20 ppm' })).status).toBe(403);
      const list = await agents.get(role)!.get('/api/heats').query({ q: `T-${tag}` });
      expect(list.status).toBe(200);
      expect(list.body.items.map((h: { heatNumber: string }) => h.heatNumber)).toContain(`T-${tag}-1`);
    }

    const updated = await engineer().put(`/api/heats/${created.body.id}`).send({ heatNumber: `T-${tag}-1`, sulfur: '25 ppm', version: 1 });
    expect(updated.status).toBe(200);
    expect(updated.body).toMatchObject({ sulfur: '25 ppm', sulfurWtPercent: 0.0025, version: 2 });
    expect((await engineer().put(`/api/heats/${created.body.id}`).send({ heatNumber: `T-${tag}-1`, sulfur: '30 ppm', version: 1 })).status).toBe(409);
    expect((await engineer().delete(`/api/heats/${created.body.id}`)).status).toBe(204);
    expect((await engineer().get(`/api/heats/${created.body.id}`)).status).toBe(404);
  });

  it('links two heats to a melt-pool check and warns when their sulfur straddles the band and turns the flow', async () => {
    const low = (await engineer().post('/api/heats').send({ heatNumber: `J-${tag}-low`, sulfur: '20 ppm' })).body;
    const high = (await engineer().post('/api/heats').send({ heatNumber: `J-${tag}-high`, sulfur: '120 ppm' })).body;
    // Pool mean temperature (1809 + 2100)/2 ≈ 1955 K: between the two parts' sign-change temperatures.
    const input = { ...domainPool, sulfur: '20 ppm', peakTemperature: '2100 K', halfWidth: '2.5 mm' };
    const res = await engineer().post(`/api/layer-checks/${meltCheckId}/melt-pool`).send({ input, firstHeatId: low.id, secondHeatId: high.id });
    expect(res.status).toBe(201);
    const codes = res.body.comparison.warnings.map((w: { code: string }) => w.code);
    // One part below 30 ppm and the other above 70 ppm: published thresholds lie inside that band
    // (Mills et al. 1998: < 30 / > 60 ppm; Mills & Keene 1990: < 50 / > 70 ppm).
    expect(codes).toContain('straddles-sulfur-band');
    expect(codes).toContain('flow-direction-differs');
    expect(res.body.comparison.parts.map((p: { flowDirection: string }) => p.flowDirection)).toEqual(['outward', 'inward']);
    expect(res.body.comparison.sulfurDifferencePpm).toBeCloseTo(100, 9);

    const list = await agents.get('reviewer')!.get(`/api/layer-checks/${meltCheckId}/melt-pool`);
    expect(list.body.items[0]).toMatchObject({ id: res.body.id, firstHeat: { heatNumber: `J-${tag}-low` }, secondHeat: { heatNumber: `J-${tag}-high` } });
    // The process sheet section comes from the stored set-up of the check revision.
    const stored = await latestMeltPoolSetupOfRevision(ctx.db, meltCheckId, 1);
    const section = meltPoolSheetSection(stored!);
    expect(section.rows.map((r) => r.value)).toContain(`J-${tag}-high: 120 ppm S, flow inward at 1955 K`);
    expect(section.cautions.join(' ')).toMatch(/hexavalent chromium/);

    // A heat used by a set-up stays in the register.
    expect((await engineer().delete(`/api/heats/${low.id}`)).status).toBe(409);
    // The same heat twice, an unknown heat, or a check of another process kind are refused (422).
    expect((await engineer().post(`/api/layer-checks/${meltCheckId}/melt-pool`).send({ input, firstHeatId: low.id, secondHeatId: low.id })).status).toBe(422);
    const unknown = await engineer().post(`/api/layer-checks/${meltCheckId}/melt-pool`).send({ input, firstHeatId: low.id, secondHeatId: '00000000-0000-4000-8000-000000000000' });
    expect(unknown.status).toBe(422);
    expect(unknown.body.error.fields).toHaveProperty('secondHeatId');
    expect((await agents.get('technician')!.post(`/api/layer-checks/${meltCheckId}/melt-pool`).send({ input, firstHeatId: low.id, secondHeatId: high.id })).status).toBe(403);
  });
});
