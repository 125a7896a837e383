import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { computeDryingPath } from '../../shared/physics/drying/compute-drying-path';
import { demoLine2DryingInput } from '../../shared/physics/drying/demo-line-2';
import { roleValues, type Role } from '../../shared/schemas/roles';
import { dryingSheetSection } from '../../server/features/drying-paths/drying-sheet-section';
import { latestDryingSetupOfRevision } from '../../server/features/drying-paths/drying-paths.service';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';

let ctx: TestContext;
const agents = new Map<Role, TestAgent>();
const engineer = () => agents.get('engineer') as TestAgent;
let dryingCheckId: string;
let generalCheckId: string;

/** Line 2 demo input written as a person types it, with units (same values as demoLine2DryingInput). */
function line2WithUnits() {
  return {
    wetThickness: '40 µm',
    solidsFraction: '35 %',
    solvent: {
      name: 'PR-2 thinner',
      density: '866.9 kg/m³',
      latentHeat: `${38.0e3 / 0.092141} J/kg`,
      molarMass: '92.141 g/mol',
      volatility: { kind: 'antoine', a: 4.07827, b: 1343.943, c: -53.773, validFrom: '308.52 K', validTo: '384.66 K' },
      diffusivity: '1e-9 m²/s',
      diffusivitySolidsExponent: 4,
      vapourDiffusivityInAir: '8.6e-6 m²/s',
      lowerFlammableLimit: '1.1 %',
    },
    film: {
      density: '1100 kg/m³',
      heatCapacity: '1800 J/(kg·K)',
      conductivity: '0.16 W/(m·K)',
      expansion: '1e-3 1/K',
      surfaceTension: '30 mN/m',
      surfaceTensionTemperatureSlope: '-0.1 mN/(m·K)',
      surfaceTensionConcentrationSlope: '-12 mN/m',
    },
    viscosity: { kind: 'exponential', solventViscosity: '0.56 mPa·s', exponent: 18 },
    oven: {
      transport: { kind: 'line', lineSpeed: '30 m/min', webWidth: '1.2 m' },
      zones: [
        { name: 'Zone 1', length: '4 m', airTemperature: '60 °C', heatTransferCoefficient: '40 W/(m²·K)', backHeatTransferCoefficient: '40 W/(m²·K)' },
        { name: 'Zone 2', length: '6 m', airTemperature: '90 °C', heatTransferCoefficient: '60 W/(m²·K)', backHeatTransferCoefficient: '60 W/(m²·K)' },
        { name: 'Zone 3', length: '6 m', airTemperature: '120 °C', heatTransferCoefficient: '80 W/(m²·K)', backHeatTransferCoefficient: '80 W/(m²·K)' },
      ],
    },
    substrate: { kind: 'thermal-mass', arealHeatCapacity: 1390 * 1170 * 50e-6, initialTemperature: '25 °C' },
    air: { density: '0.995 kg/m³', heatCapacity: '1009 J/(kg·K)', thermalDiffusivity: '29.9e-6 m²/s' },
  };
}

const roundFluid = (name: string) => ({
  name,
  kind: 'solution',
  referenceTemperature: '20 °C',
  density: { value: '1000 kg/m³' },
  expansion: { value: '1e-3 1/K' },
  viscosity: { law: 'points', points: [{ temperature: '20 °C', value: '10 mPa·s' }] },
  surfaceTension: { value: '30 mN/m' },
  surfaceTensionSlope: { value: '-0.1 mN/(m·K)' },
  conductivity: { value: '0.1 W/(m·K)' },
  heatCapacity: { value: '1000 J/(kg·K)' },
});

const check = (fluidId: string, processKind: string, title: string) => ({
  title,
  fluidId,
  processKind,
  temperature: '20 °C',
  depth: '40 µm',
  bottom: { mechanics: 'rigid', thermal: 'conducting' },
  top: 'surface',
  heating: { mode: 'deltaT', deltaT: '0.5 K' },
});

beforeAll(async () => {
  ctx = createTestContext();
  for (const role of roleValues) agents.set(role, await signedInAgent(ctx.app, await createTestUser(ctx.db, { role })));
  const fluid = await engineer().post('/api/fluids').send(roundFluid(`Drying test fluid ${Date.now()}`));
  expect(fluid.status).toBe(201);
  const drying = await engineer().post('/api/layer-checks').send(check(fluid.body.id, 'drying-coat', `Line 2 primer ${Date.now()}`));
  expect(drying.status).toBe(201);
  dryingCheckId = drying.body.id;
  const general = await engineer().post('/api/layer-checks').send(check(fluid.body.id, 'general-layer', `General ${Date.now()}`));
  generalCheckId = general.body.id;
});
afterAll(async () => {
  await ctx.close();
});

describe('POST /api/drying-paths/evaluate', () => {
  it('answers exactly what the physics core computes for the Line 2 demo input (SI numbers in, JSON out)', async () => {
    const res = await engineer().post('/api/drying-paths/evaluate').send(demoLine2DryingInput());
    expect(res.status).toBe(200);
    const core = JSON.parse(JSON.stringify(computeDryingPath(demoLine2DryingInput())));
    const { cautions, closingLine, ...result } = res.body;
    expect(result).toEqual(core);
    expect(cautions.join(' ')).toMatch(/25 % of the lower flammable limit/);
    expect(closingLine).toMatch(/not a safety design tool/);
  });

  it('reads units as typed: the Line 2 input with units gives the same path, dry thickness = wet × volume solids and t = L / v per zone', async () => {
    const res = await engineer().post('/api/drying-paths/evaluate').send(line2WithUnits());
    expect(res.status).toBe(200);
    const core = JSON.parse(JSON.stringify(computeDryingPath(demoLine2DryingInput())));
    expect(res.body.onset.verdict).toBe(core.onset.verdict);
    expect(res.body.series.thickness.at(-1)).toBeCloseTo(core.series.thickness.at(-1), 12);
    // Dry thickness = wet thickness × volume solids: 40 µm × 0.35 = 14 µm (DOMAIN §5, common practice).
    expect(res.body.massBalance.expectedDryThickness).toBeCloseTo(14e-6, 12);
    expect(res.body.massBalance.modelledDryThickness / 14e-6).toBeCloseTo(1, 5);
    // Residence time = zone length ÷ line speed: 4 m / (30 m/min) = 8 s; 6 m → 12 s (DOMAIN §7, derived).
    expect(res.body.zones.map((z: { residenceTime: number }) => z.residenceTime)).toEqual([expect.closeTo(8, 9), expect.closeTo(12, 9), expect.closeTo(12, 9)]);
  });

  it('sizes fresh air as Q = ṁRT/(M·p) ÷ (0.25 × LFL) per zone and says so as a caution deferring to NFPA 86 / EN 1539', async () => {
    const res = await engineer().post('/api/drying-paths/evaluate').send(demoLine2DryingInput());
    for (const zone of res.body.zones) {
      const v = zone.ventilation;
      // Vapour volume by the ideal gas law at exhaust conditions: V̇ = ṁRT/(M·p) with R = 8.314462618 J/(mol·K)
      // (CODATA 2018) and p = 101 325 Pa (CGPM 1954); so V̇·M·p/(R·ṁ) is a temperature of a hot exhaust.
      const exhaustTemperature = (v.vapourVolumeRate * 0.092141 * 101_325) / (8.314_462_618 * zone.solventMassRate);
      expect(exhaustTemperature).toBeGreaterThan(273.15);
      expect(exhaustTemperature).toBeLessThan(273.15 + 200);
      expect(v.lflFraction).toBe(0.25); // NFPA 86: ≤ 25 % LFL without continuous monitoring
      expect(v.freshAirRequired).toBeCloseTo(v.vapourVolumeRate / (0.25 * 0.011), 12);
      expect(v.text).toMatch(/NFPA 86 \/ EN 1539/);
      expect(v.text).toMatch(/authority having jurisdiction/);
    }
    const monitored = await engineer().post('/api/drying-paths/evaluate').send({ ...demoLine2DryingInput(), continuousSolventMonitoring: true });
    // NFPA 86: up to 50 % LFL with continuous solvent-vapour monitoring → half the air.
    expect(monitored.body.zones[2].ventilation.freshAirRequired).toBeCloseTo(res.body.zones[2].ventilation.freshAirRequired / 2, 9);
  });

  it('answers 400 naming the field for a missing value or an unreadable unit', async () => {
    const { wetThickness: _omit, ...missing } = line2WithUnits();
    const a = await engineer().post('/api/drying-paths/evaluate').send(missing);
    expect(a.status).toBe(400);
    expect(a.body.error.fields).toHaveProperty('wetThickness');
    const b = await engineer().post('/api/drying-paths/evaluate').send({ ...line2WithUnits(), wetThickness: '40 kg' });
    expect(b.status).toBe(400);
    expect(b.body.error.fields.wetThickness).toMatch(/length/);
    const zones = line2WithUnits().oven.zones.map((z, i) => (i === 1 ? { ...z, length: undefined } : z));
    const c = await engineer().post('/api/drying-paths/evaluate').send({ ...line2WithUnits(), oven: { transport: { kind: 'line', lineSpeed: '30 m/min' }, zones } });
    expect(c.status).toBe(400);
    expect(c.body.error.fields).toHaveProperty(['oven.zones.1.length']);
  });

  it('answers 422 naming the field when the physics refuses a value (a 6 cm "film")', async () => {
    const res = await engineer().post('/api/drying-paths/evaluate').send({ ...line2WithUnits(), wetThickness: '6 cm' });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.wetThickness).toMatch(/0\.05 m/);
  });

  it('lets every signed-in role evaluate and nobody without a session', async () => {
    for (const role of roleValues) expect((await agents.get(role)!.post('/api/drying-paths/evaluate').send(demoLine2DryingInput())).status).toBe(200);
    const anonymous = await request(ctx.app).post('/api/drying-paths/evaluate').send(demoLine2DryingInput());
    expect(anonymous.status).toBe(401);
  });
});

describe('drying set-ups saved with a layer check revision', () => {
  it('saves the input and result summary against the current revision, lists it, and feeds the process sheet section', async () => {
    const res = await engineer().post(`/api/layer-checks/${dryingCheckId}/drying-setups`).send({ title: 'Line 2 at 30 m/min', input: line2WithUnits() });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ checkId: dryingCheckId, revision: 1, title: 'Line 2 at 30 m/min' });
    expect(res.body.summary.zones).toHaveLength(3);
    expect(res.body.summary.expectedDryThickness).toBeCloseTo(14e-6, 12);

    const list = await agents.get('technician')!.get(`/api/layer-checks/${dryingCheckId}/drying-setups`);
    expect(list.status).toBe(200);
    expect(list.body.items[0].id).toBe(res.body.id);
    const one = await agents.get('reviewer')!.get(`/api/drying-setups/${res.body.id}`);
    expect(one.body.summary).toEqual(res.body.summary);

    // The stored input re-evaluates to the same verdict (it was stored in SI).
    const again = await engineer().post('/api/drying-paths/evaluate').send(one.body.input);
    expect(again.body.onset.verdict).toBe(res.body.summary.verdict);

    expect((await latestDryingSetupOfRevision(ctx.db, dryingCheckId, 1))?.id).toBe(res.body.id);
    expect(await latestDryingSetupOfRevision(ctx.db, dryingCheckId, 2)).toBeNull();
    const section = dryingSheetSection(one.body);
    expect(section.title).toBe('Drying path');
    expect(section.rows.map((r) => r.label)).toContain('Zone 3: solvent and fresh air');
    expect(section.cautions.at(-1)).toMatch(/not a safety design tool/);
  });

  it('refuses technicians and reviewers (403), a check of another process kind (422) and an unknown check (404)', async () => {
    for (const role of ['technician', 'reviewer', 'administrator'] as const) {
      expect((await agents.get(role)!.post(`/api/layer-checks/${dryingCheckId}/drying-setups`).send({ title: 'x', input: line2WithUnits() })).status).toBe(403);
    }
    const general = await engineer().post(`/api/layer-checks/${generalCheckId}/drying-setups`).send({ title: 'x', input: line2WithUnits() });
    expect(general.status).toBe(422);
    expect(general.body.error.fields).toHaveProperty('processKind');
    const unknown = await engineer().post('/api/layer-checks/00000000-0000-4000-8000-000000000000/drying-setups').send({ title: 'x', input: line2WithUnits() });
    expect(unknown.status).toBe(404);
  });

  it('writes nothing when the input is refused', async () => {
    const before = (await engineer().get(`/api/layer-checks/${dryingCheckId}/drying-setups`)).body.items.length;
    const res = await engineer().post(`/api/layer-checks/${dryingCheckId}/drying-setups`).send({ title: 'bad', input: { ...line2WithUnits(), wetThickness: '6 cm' } });
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toHaveProperty(['input.wetThickness']);
    expect((await engineer().get(`/api/layer-checks/${dryingCheckId}/drying-setups`)).body.items.length).toBe(before);
  });
});
