import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type TestAgent from 'supertest/lib/agent';
import { auditEvents } from '../../server/db/schema';
import { fluids } from '../../server/db/schema/fluids';
import { roleValues, type Role } from '../../shared/schemas/roles';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';

let ctx: TestContext;
const agents = new Map<Role, TestAgent>();
beforeAll(async () => {
  ctx = createTestContext();
  for (const role of roleValues) agents.set(role, await signedInAgent(ctx.app, await createTestUser(ctx.db, { role })));
});
afterAll(async () => {
  await ctx.close();
});
const engineer = () => agents.get('engineer') as TestAgent;

/** A fluid typed the way people type it: cP, dyn/cm, °F, g/cm³. */
function fluidBody(name: string, overrides: Record<string, unknown> = {}) {
  return {
    name,
    kind: 'solvent',
    referenceTemperature: '68 °F',
    density: { value: '0.8669 g/cm³', source: 'handbook (from memory)', uncertaintyPercent: 1 },
    expansion: { value: '0.00107 1/K', source: 'handbook (from memory)' },
    viscosity: { law: 'points', points: [{ temperature: '20 °C', value: '0.59 cP' }, { temperature: '50 °C', value: '0.42 cP' }], source: 'handbook (from memory)' },
    surfaceTension: { value: '28.52 dyn/cm', source: 'Adamson & Gast 1997', uncertaintyPercent: 1, distribution: 'uniform' },
    surfaceTensionSlope: { value: '-0.119 mN/(m·K)', source: 'from memory' },
    conductivity: { value: '0.131 W/(m·K)', source: 'from memory' },
    heatCapacity: { value: '1.7 kJ/(kg·K)', source: 'from memory' },
    ...overrides,
  };
}

describe('fluid library', () => {
  it('creates a fluid from non-SI inputs, keeps the text as entered and converts to SI exactly', async () => {
    const res = await engineer().post('/api/fluids').send(fluidBody(`Toluene test ${Date.now()}`));
    expect(res.status).toBe(201);
    // 68 °F = 293.15 K exactly (NIST SP 811 Appendix B: T/K = (t/°F + 459.67)·5/9)
    expect(res.body.referenceTemperature).toEqual({ value: '68 °F', si: expect.closeTo(293.15, 9) });
    // 1 dyn/cm = 1 mN/m = 0.001 N/m (NIST SP 811); 1 cP = 1 mPa·s; 1 g/cm³ = 1000 kg/m³
    expect(res.body.surfaceTension.si).toBeCloseTo(0.02852, 9);
    expect(res.body.surfaceTension.value).toBe('28.52 dyn/cm');
    expect(res.body.surfaceTension.distribution).toBe('uniform');
    expect(res.body.density.si).toBeCloseTo(866.9, 6);
    expect(res.body.viscosity.fitPreExponential * Math.exp(res.body.viscosity.fitActivationTemperature / 293.15)).toBeCloseTo(0.00059, 9);
    expect(res.body.version).toBe(1);
    const audit = await ctx.db.select().from(auditEvents).where(and(eq(auditEvents.entityId, res.body.id), eq(auditEvents.action, 'fluid.created')));
    expect(audit).toHaveLength(1);
  });

  it('converts a kinematic viscosity point (cSt) with the density: ν·ρ (ASTM D445 definition of kinematic viscosity)', async () => {
    const body = fluidBody(`Oil cSt ${Date.now()}`, {
      kind: 'oil',
      referenceTemperature: '25 °C',
      density: { value: '960 kg/m³' },
      expansion: { value: '0 1/K' },
      viscosity: { law: 'points', points: [{ temperature: '25 °C', value: '100 cSt' }] },
    });
    const res = await engineer().post('/api/fluids').send(body);
    expect(res.status).toBe(201);
    // 100 cSt = 1e-4 m²/s; × 960 kg/m³ = 0.096 Pa·s
    expect(res.body.viscosity.fitPreExponential).toBeCloseTo(0.096, 12);
  });

  it('rejects unknown units with 422 naming the field', async () => {
    const res = await engineer()
      .post('/api/fluids')
      .send(fluidBody('Bad units', { viscosity: { law: 'points', points: [{ temperature: '20 °C', value: '12 furlongs' }] } }));
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('unprocessable');
    expect(Object.keys(res.body.error.fields)).toContain('viscosity.points.0.value');
  });

  it('rejects out-of-range values with 422 naming the field and the limit', async () => {
    const res = await engineer()
      .post('/api/fluids')
      .send(fluidBody('Bad ranges', { density: { value: '-5 kg/m³' }, conductivity: { value: '0 W/(m·K)' }, surfaceTension: { value: '1.5 N/m' } }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields['density.value']).toMatch(/density must be > 0/);
    expect(res.body.error.fields['conductivity.value']).toMatch(/conductivity must be > 0/);
    expect(res.body.error.fields['surfaceTension.value']).toMatch(/molten-metal/);
    // the same surface tension is accepted for a molten metal (pure iron 1.943 N/m, Sahoo et al. 1988)
    const metal = await engineer().post('/api/fluids').send(fluidBody(`Metal ${Date.now()}`, { kind: 'molten-metal', surfaceTension: { value: '1.943 N/m' } }));
    expect(metal.status).toBe(201);
    expect(await ctx.db.select().from(fluids).where(eq(fluids.name, 'Bad ranges'))).toHaveLength(0);
  });

  it('asks for a heat capacity or a thermal diffusivity', async () => {
    const body = fluidBody('No thermal') as Record<string, unknown>;
    delete body.heatCapacity;
    const res = await engineer().post('/api/fluids').send(body);
    expect(res.status).toBe(422);
    expect(res.body.error.fields.heatCapacity).toMatch(/heat capacity or a thermal diffusivity/);
  });

  it('updates with the current version, and answers a stale save with 409 and the current fluid', async () => {
    const created = (await engineer().post('/api/fluids').send(fluidBody(`Versioned ${Date.now()}`))).body;
    const first = await engineer().put(`/api/fluids/${created.id}`).send({ ...fluidBody(created.name), conductivity: { value: '0.14 W/(m·K)' }, version: 1 });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(2);
    expect(first.body.conductivity.si).toBeCloseTo(0.14, 12);
    const stale = await engineer().put(`/api/fluids/${created.id}`).send({ ...fluidBody(created.name), conductivity: { value: '0.2 W/(m·K)' }, version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.current.version).toBe(2);
    expect(stale.body.current.conductivity.si).toBeCloseTo(0.14, 12);
  });

  it('duplicates and archives (never deletes); archived fluids leave the default list', async () => {
    const name = `Archivable ${Date.now()}`;
    const created = (await engineer().post('/api/fluids').send(fluidBody(name))).body;
    const copy = await engineer().post(`/api/fluids/${created.id}/duplicate`).send({});
    expect(copy.status).toBe(201);
    expect(copy.body.name).toBe(`${name} (copy)`);
    expect(copy.body.surfaceTension).toEqual(created.surfaceTension);
    const archived = await engineer().post(`/api/fluids/${created.id}/archive`).send({ version: 1 });
    expect(archived.status).toBe(200);
    expect(archived.body.archived).toBe(true);
    const list = await engineer().get('/api/fluids').query({ q: name });
    expect(list.body.items.map((f: { id: string }) => f.id)).toEqual([copy.body.id]);
    const withArchived = await engineer().get('/api/fluids').query({ q: name, includeArchived: 'true' });
    expect(withArchived.body.total).toBe(2);
    expect((await engineer().delete(`/api/fluids/${created.id}`)).status).toBe(404);
  });

  it('pages, sorts and filters on the server', async () => {
    const tag = `zz-sort-${Date.now()}`;
    for (const [suffix, sigma] of [['a', '30 mN/m'], ['b', '20 mN/m'], ['c', '25 mN/m']] as const) {
      expect((await engineer().post('/api/fluids').send(fluidBody(`${tag}-${suffix}`, { surfaceTension: { value: sigma } }))).status).toBe(201);
    }
    const page = await engineer().get('/api/fluids').query({ q: tag, sort: 'surfaceTension', dir: 'desc', pageSize: 2, page: 1 });
    expect(page.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(page.body.items.map((f: { name: string }) => f.name)).toEqual([`${tag}-a`, `${tag}-c`]);
    const page2 = await engineer().get('/api/fluids').query({ q: tag, sort: 'surfaceTension', dir: 'desc', pageSize: 2, page: 2 });
    expect(page2.body.items.map((f: { name: string }) => f.name)).toEqual([`${tag}-b`]);
    expect((await engineer().get('/api/fluids').query({ sort: 'colour' })).status).toBe(400);
  });

  it('lets every role read, only engineers write', async () => {
    for (const role of roleValues) {
      expect((await (agents.get(role) as TestAgent).get('/api/fluids')).status).toBe(200);
    }
    for (const role of ['administrator', 'technician', 'reviewer'] as const) {
      const res = await (agents.get(role) as TestAgent).post('/api/fluids').send(fluidBody(`Denied ${role}`));
      expect(res.status).toBe(403);
    }
  });

  it('seeds the demo fluids with their sources; water matches the IAPWS R1-76 table', async () => {
    const list = await engineer().get('/api/fluids').query({ q: 'Water' });
    const water = list.body.items.find((f: { name: string }) => f.name === 'Water');
    expect(water).toBeDefined();
    const detail = (await engineer().get(`/api/fluids/${water.id}`)).body;
    // IAPWS R1-76(2014) Table 1: 72.74 mN/m at 20 °C
    expect(detail.surfaceTension.si * 1000).toBeCloseTo(72.74, 2);
    expect(detail.surfaceTension.source).toMatch(/IAPWS R1-76/);
    // IAPWS R12-08: 1.0016 mPa·s at 20 °C, 0.1 MPa (REFERENCES.md)
    expect(detail.viscosity.points[1]).toEqual({ temperature: '20 °C', value: '1.0016 mPa·s' });
    expect(detail.viscosity.source).toMatch(/IAPWS R12-08/);
    const all = (await engineer().get('/api/fluids').query({ pageSize: 200 })).body.items.map((f: { name: string }) => f.name);
    for (const name of ['Ethanol', 'Toluene', 'Silicone oil 100 cSt', 'Primer solvent blend PB-7 (invented)', 'Low-sulfur steel melt']) {
      expect(all).toContain(name);
    }
    const steel = (await engineer().get('/api/fluids').query({ q: 'steel melt' })).body.items[0];
    const steelDetail = (await engineer().get(`/api/fluids/${steel.id}`)).body;
    // Sahoo, DebRoy & McNallan (1988) Metall. Trans. B 19:483: γ_m° = 1.943 N/m, A = 4.3e-4 N/(m·K)
    expect(steelDetail.surfaceTension.si).toBeCloseTo(1.943, 6);
    expect(steelDetail.surfaceTensionSlope.si).toBeCloseTo(-4.3e-4, 9);
    expect(steelDetail.surfaceTension.source).toMatch(/Sahoo/);
    const primer = (await engineer().get('/api/fluids').query({ q: 'PB-7' })).body.items[0];
    expect((await engineer().get(`/api/fluids/${primer.id}`)).body.density.source).toMatch(/INVENTED/);
  });
});

describe('fluid CSV', () => {
  it('exports CSV that imports back', async () => {
    const name = `Round trip ${Date.now()}`;
    await engineer().post('/api/fluids').send(fluidBody(name));
    const exported = await engineer().get('/api/fluids/export.csv');
    expect(exported.status).toBe(200);
    expect(exported.headers['content-type']).toMatch(/text\/csv/);
    const lines = exported.text.split('\r\n');
    const header = lines[0];
    const row = lines.find((l) => l.startsWith(`${name},`));
    expect(row).toBeDefined();
    const csv = `${header}\r\n${(row as string).replace(name, `${name} again`)}\r\n`;
    const preview = await engineer().post('/api/fluids/import/preview').send({ csv });
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ ok: true, errors: [], rows: [{ line: 2, name: `${name} again`, valid: true }] });
    const commit = await engineer().post('/api/fluids/import/commit').send({ csv });
    expect(commit.status).toBe(201);
    expect(commit.body.created).toBe(1);
    const imported = (await engineer().get(`/api/fluids/${commit.body.ids[0]}`)).body;
    expect(imported.surfaceTension.value).toBe('28.52 dyn/cm');
  });

  it('saves nothing when one line is bad, and reports that line number', async () => {
    const tag = `csv-${Date.now()}`;
    const header = 'name,kind,reference_temperature,density,expansion,surface_tension,surface_tension_slope,conductivity,heat_capacity,viscosity_points';
    const good = (n: string) => `${tag}-${n},solvent,20 °C,790 kg/m³,0.001 1/K,22 mN/m,-0.08 mN/(m·K),0.17 W/(m·K),2.4 kJ/(kg·K),20 °C = 1.2 mPa·s`;
    const bad = `${tag}-bad,solvent,20 °C,790 kg/m³,0.001 1/K,22 mN/m,-0.08 mN/(m·K),0.17 W/(m·K),2.4 kJ/(kg·K),20 °C = 12 furlongs`;
    const csv = [header, good('1'), good('2'), bad, good('3')].join('\n');
    const preview = await engineer().post('/api/fluids/import/preview').send({ csv });
    expect(preview.body.ok).toBe(false);
    expect(preview.body.errors).toHaveLength(1);
    expect(preview.body.errors[0]).toMatchObject({ line: 4, field: 'viscosity_points' });
    const commit = await engineer().post('/api/fluids/import/commit').send({ csv });
    expect(commit.status).toBe(422);
    expect(commit.body.error.message).toMatch(/line 4/);
    expect(Object.keys(commit.body.error.fields)).toContain('line.4.viscosity_points');
    const after = await engineer().get('/api/fluids').query({ q: tag });
    expect(after.body.total).toBe(0);
  });

  it('counts lines correctly past a quoted cell that spans two lines', async () => {
    const header = 'name,kind,reference_temperature,density,expansion,surface_tension,surface_tension_slope,conductivity,heat_capacity,viscosity_points,notes';
    const row = (n: string, density: string, notes: string) =>
      `ml-${n},solvent,20 °C,${density},0.001 1/K,22 mN/m,-0.08 mN/(m·K),0.17 W/(m·K),2.4 kJ/(kg·K),20 °C = 1.2 mPa·s,${notes}`;
    const csv = [header, row('1', '790 kg/m³', '"first line\nsecond line"'), row('2', '-1 kg/m³', 'x')].join('\n');
    const preview = await engineer().post('/api/fluids/import/preview').send({ csv });
    expect(preview.body.errors).toEqual([expect.objectContaining({ line: 4, field: 'density' })]);
  });
});
