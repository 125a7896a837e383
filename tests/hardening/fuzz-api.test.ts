/**
 * Property-based fuzzing (fast-check) of every JSON API route in routeRegistry: arbitrary JSON,
 * strings, huge and non-finite numbers, prototype-pollution keys and odd content types as the body;
 * arbitrary query strings; hostile path parameters. Each request is sent as a user whose role the
 * policy allows (anonymous for public routes), on a database of its own. Properties:
 *   - never a 5xx (bad input is 400/404/409/413/415/422, the error shape from the API contract);
 *   - never a hang (each request has a 20 s limit);
 *   - never a partial write: on any 4xx no table gained or lost a row;
 *   - Object.prototype is never polluted.
 */
import fc from 'fast-check';
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { policy, PUBLIC, SIGNED_IN } from '../../server/auth/policy';
import { routeRegistry, type RegisteredRoute } from '../../server/http/define-route';
import { demoFluidInputs } from '../../scripts/lib/seed/demo-fluids';
import { runDemoSeed } from '../../scripts/lib/seed/run-demo-seed';
import type { Role } from '../../shared/schemas/roles';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';
import { createTestContext, type TestContext } from '../integration/helpers/test-app';
import { createTestUser, signedInAgent } from '../integration/helpers/users';

const REQUEST_LIMIT_MS = 20_000;
const RUNS_PER_ROUTE = Number(process.env.QUIETLAYER_FUZZ_RUNS ?? 8);

let database: ScratchDatabase;
let ctx: TestContext;
const agents = new Map<Role, TestAgent>();
let tables: string[] = [];
let fluidId = '';
let heatId = '';

beforeAll(async () => {
  database = await createScratchDatabase();
  await runDemoSeed(database.url, { bcryptCost: 4, log: () => {} });
  ctx = createTestContext({ databaseUrl: database.url });
  for (const role of ['administrator', 'engineer', 'technician', 'reviewer'] as const) {
    agents.set(role, await signedInAgent(ctx.app, await createTestUser(ctx.db, { role })));
  }
  const result = await ctx.pool.query<{ table_name: string }>(
    "select table_name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' order by table_name",
  );
  // rate_limit_hits counts every throttled request, refused ones included, by design: not a record.
  tables = result.rows.map((row) => row.table_name).filter((name) => name !== 'rate_limit_hits');
  const fluids = await agents.get('engineer')!.get('/api/fluids');
  fluidId = fluids.body.items[0].id;
}, 120_000);

afterAll(async () => {
  await ctx?.close();
  await database?.drop();
});

async function rowCounts(): Promise<Record<string, number>> {
  const select = tables.map((name) => `(select count(*)::int from "${name}") as "${name}"`).join(', ');
  const result = await ctx.db.execute(sql.raw(`select ${select}`));
  return result.rows[0] as Record<string, number>;
}

/** The client for a route: anonymous for public ones, else the first role the policy allows. */
function clientFor(route: RegisteredRoute): TestAgent | ReturnType<typeof request> {
  const rule = policy[route.action];
  if (rule === PUBLIC) return request(ctx.app);
  if (rule === SIGNED_IN) return agents.get('engineer')!;
  return agents.get((rule as readonly Role[])[0])!;
}

const FIELD_NAMES = [
  'title', 'name', 'email', 'password', 'token', 'fluidId', 'depth', 'temperature', 'heating', 'mode', 'deltaT',
  'processKind', 'csv', 'cases', 'notes', 'version', 'role', 'displayName', 'active', 'page', 'pageSize', 'q', 'sort',
  'dir', 'check', 'window', 'top', 'bottom', 'kind', 'fluid', 'samples', 'seed', 'reason', 'revision', 'id', 'from', 'to',
  'actor', 'entityType', 'download', 'density', 'viscosity', 'surfaceTension', 'alertThreshold', 'layerCheckId',
];
const HOSTILE_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'valueOf', '__defineGetter__'];
const HOSTILE_STRINGS = [
  '', ' ', '../../../../etc/passwd', '..\\..\\windows\\win.ini', '%00', '\u0000', "' OR 1=1 --", '"; drop table users; --',
  '<img src=x onerror=window.__xss=1>', '{{7*7}}', '${7*7}', '=HYPERLINK("http://evil.example")', 'NaN', 'Infinity',
  '-0', '1e999', '0x10', 'true', 'null', '\uD800', '\u202Eevil', 'x'.repeat(70_000), '😀'.repeat(1_000),
];
const HUGE_NUMBERS = [1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, -Number.MAX_SAFE_INTEGER - 2, 5e-324, -0, 2 ** 31, -(2 ** 31) - 1, 1e21];

const hostileString = fc.oneof(fc.constantFrom(...HOSTILE_STRINGS), fc.string({ maxLength: 40 }), fc.string({ unit: 'grapheme', maxLength: 20 }));
const hostileNumber = fc.oneof(fc.constantFrom(...HUGE_NUMBERS), fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer());
const leaf = fc.oneof(hostileString, hostileNumber, fc.boolean(), fc.constant(null));
const value: fc.Arbitrary<unknown> = fc.letrec<{ value: unknown }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    leaf,
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(fc.oneof(fc.constantFrom(...FIELD_NAMES), fc.string({ maxLength: 8 })), tie('value'), { maxKeys: 6 }),
  ),
})).value;

/** JSON text, sometimes with prototype-pollution keys and non-finite numbers spliced in as raw text. */
const bodyText = fc.oneof(
  value.map((v) => JSON.stringify(v) ?? 'null'),
  fc
    .tuple(fc.dictionary(fc.constantFrom(...FIELD_NAMES), value, { maxKeys: 6 }), fc.constantFrom(...HOSTILE_KEYS), value)
    .map(([object, key, inner]) => {
      const text = JSON.stringify(object);
      const spliced = `"${key}":${JSON.stringify({ polluted: true, isAdmin: true, role: 'administrator', inner })}`;
      return text === '{}' ? `{${spliced}}` : `{${spliced},${text.slice(1)}`;
    }),
  fc.constantFrom('{"depth":1e999}', '{"page":-1e999}', '[]', '"just a string"', '12345', '{', '{"a":', '\u0000', '{"a":1,"a":2}', '{"__proto__":{"polluted":true}}', '{"constructor":{"prototype":{"polluted":true}}}'),
);
const contentType = fc.constantFrom('application/json', 'application/json', 'application/json; charset=utf-8', 'text/plain', 'application/x-www-form-urlencoded', 'application/json; charset=latin-7', 'multipart/form-data; boundary=x');

const queryString = fc
  .array(fc.tuple(fc.oneof(fc.constantFrom(...FIELD_NAMES), fc.constantFrom(...HOSTILE_KEYS), fc.constantFrom('a[b]', 'page[0]', 'q[]'), fc.string({ maxLength: 6 })), fc.oneof(hostileString, hostileNumber.map(String))), { maxLength: 6 })
  .map((pairs) => pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&'));

const pathParam = fc.oneof(
  fc.uuid(),
  fc.constantFrom('..%2F..%2Fetc%2Fpasswd', '%2e%2e', '00000000-0000-0000-0000-000000000000', 'null', 'undefined', '%00', 'x'.repeat(3000), '1;select', '-1', '1e999'),
  fc.string({ minLength: 1, maxLength: 30 }).map(encodeURIComponent),
);

function concretePath(route: RegisteredRoute, param: string): string {
  return route.path.replace(/:(\w+)/g, param);
}

interface Outcome {
  route: string;
  status: number;
  detail: string;
}

async function sendOnce(route: RegisteredRoute, options: { param: string; query: string; body?: string; type?: string }): Promise<Outcome> {
  const client = clientFor(route);
  const path = concretePath(route, options.param) + (options.query ? `?${options.query}` : '');
  let call = client[route.method](path).timeout({ response: REQUEST_LIMIT_MS, deadline: REQUEST_LIMIT_MS });
  if (options.body !== undefined) call = call.set('Content-Type', options.type ?? 'application/json').send(options.body);
  const before = await rowCounts();
  const label = `${route.method.toUpperCase()} ${route.path}`;
  let response;
  try {
    response = await call;
  } catch (error) {
    return { route: label, status: -1, detail: `no answer within ${REQUEST_LIMIT_MS} ms: ${(error as Error).message.slice(0, 200)}` };
  }
  const status = response.status;
  const detail = response.text.slice(0, 200);
  // Node's HTTP parser answers an oversized request line or header block itself (431), before the app.
  if (status >= 400 && status !== 431) expect(response.body?.error?.code, `${label} ${status}: error shape (${detail})`).toEqual(expect.any(String));
  if (status >= 400 && status < 500) {
    const after = await rowCounts();
    expect(after, `${label} answered ${status} but changed row counts`).toEqual(before);
  }
  return { route: label, status, detail };
}

function fuzzableRoutes(): RegisteredRoute[] {
  // Sign-out ends nothing for the anonymous client, so it is fuzzed too; every route is included.
  return [...routeRegistry.values()].sort((a, b) => `${a.path}${a.method}`.localeCompare(`${b.path}${b.method}`));
}

/** A valid body for the main write and evaluate routes, to be spoiled one field at a time. */
function validBodies(): Array<{ key: string; body: Record<string, unknown> }> {
  const check = {
    fluidId,
    processKind: 'drying-coat',
    temperature: '40 °C',
    depth: '50 µm',
    bottom: { mechanics: 'rigid', thermal: 'conducting' },
    top: 'surface',
    heating: { mode: 'deltaT', deltaT: '2 K' },
  };
  return [
    { key: 'POST /api/layer-checks/evaluate', body: check },
    { key: 'POST /api/layer-checks/window', body: { check, window: {} } },
    { key: 'POST /api/layer-checks', body: { ...check, title: 'Fuzzed check', notes: 'notes' } },
    { key: 'POST /api/fluids', body: { ...demoFluidInputs()[0], name: 'Fuzzed fluid' } },
    { key: 'POST /api/heats', body: { heatNumber: 'H-1', sulfur: '0.012 wt %' } },
    { key: 'POST /api/batch/evaluate', body: { cases: [{ id: 'a', bottom: 'rigid', top: 'free', rayleigh: 500, marangoni: 20 }] } },
    { key: 'POST /api/users/invitations', body: { email: 'fuzz@larkspur.example', displayName: 'Fuzz', role: 'technician' } },
  ];
}

const QUANTITY_SPOILERS = [
  '0 µm', '-1 m', '1e308 m', '1e-308 m', '5e-324 m', 'NaN m', 'Infinity K', '1e999 K', '5 furlongs', '50', '50 µm µm', '−5 K',
  '0 K', '-273.15 °C', '-300 °C', '1e6 °C', '1e300 W/(m²·K)', '0 W/(m²·K)', '1e-300 K', '9'.repeat(400) + ' m', '50 µm/0',
];

/** Every path to a leaf of a JSON value, e.g. ['heating', 'deltaT']. */
function leafPaths(value: unknown, prefix: string[] = []): string[][] {
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>);
    return entries.length === 0 ? [prefix] : entries.flatMap(([k, v]) => leafPaths(v, [...prefix, k]));
  }
  return [prefix];
}

function withReplaced(body: unknown, path: string[], replacement: unknown): unknown {
  if (path.length === 0) return replacement;
  const copy: Record<string, unknown> = Array.isArray(body) ? ([...body] as unknown as Record<string, unknown>) : { ...(body as Record<string, unknown>) };
  const [head, ...rest] = path;
  if (replacement === undefined && rest.length === 0) delete copy[head];
  else copy[head] = withReplaced(copy[head], rest, replacement);
  return copy;
}

describe('fuzzing every registered API route', () => {
  it('covers every route in routeRegistry (the same walk as the role matrix)', () => {
    expect(fuzzableRoutes().length).toBe(routeRegistry.size);
    expect(routeRegistry.size).toBeGreaterThan(30);
  });

  it('bodies: arbitrary JSON, pollution keys, odd content types → never 5xx, never a hang, never a partial write', async () => {
    const failures: Outcome[] = [];
    for (const route of fuzzableRoutes().filter((r) => r.method !== 'get')) {
      await fc.assert(
        fc.asyncProperty(pathParam, bodyText, contentType, async (param, body, type) => {
          const outcome = await sendOnce(route, { param, query: '', body, type });
          if (outcome.status < 0 || outcome.status >= 500) failures.push(outcome);
        }),
        { numRuns: RUNS_PER_ROUTE, seed: 20_008, endOnFailure: true },
      );
    }
    expect(failures).toEqual([]);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(({} as Record<string, unknown>).isAdmin).toBeUndefined();
  }, 600_000);

  it('queries and path parameters: arbitrary strings and numbers → never 5xx, never a hang', async () => {
    const failures: Outcome[] = [];
    for (const route of fuzzableRoutes()) {
      await fc.assert(
        fc.asyncProperty(pathParam, queryString, async (param, query) => {
          const outcome = await sendOnce(route, { param, query, body: route.method === 'get' ? undefined : '{}' });
          if (outcome.status < 0 || outcome.status >= 500) failures.push(outcome);
        }),
        { numRuns: RUNS_PER_ROUTE, seed: 80_002, endOnFailure: true },
      );
    }
    expect(failures).toEqual([]);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  }, 600_000);

  it('valid bodies with one field spoiled (absurd quantities, wrong types, removed) → never 5xx, never a hang, never a partial write', async () => {
    const failures: Outcome[] = [];
    let checked = 0;
    for (const { key, body } of validBodies()) {
      const route = routeRegistry.get(key);
      expect(route, `${key} is registered`).toBeDefined();
      const sane = await sendOnce(route!, { param: '', query: '', body: JSON.stringify(body) });
      expect(sane.status, `${key} accepts the unspoiled body: ${sane.detail}`).toBeLessThan(300);
      const paths = leafPaths(body);
      await fc.assert(
        fc.asyncProperty(
          fc.constantFrom(...paths),
          fc.oneof(fc.constantFrom(...QUANTITY_SPOILERS), leaf, value, fc.constant(undefined)),
          async (path, replacement) => {
            checked += 1;
            const outcome = await sendOnce(route!, { param: '', query: '', body: JSON.stringify(withReplaced(body, path, replacement)) ?? 'null' });
            if (outcome.status < 0 || outcome.status >= 500) failures.push({ ...outcome, detail: `${path.join('.')} = ${JSON.stringify(replacement)?.slice(0, 80)}: ${outcome.detail}` });
          },
        ),
        { numRuns: RUNS_PER_ROUTE * 6, seed: 8_008, endOnFailure: true },
      );
    }
    expect(checked).toBeGreaterThan(0);
    expect(failures).toEqual([]);
  }, 600_000);

  it('CSV imports: arbitrary CSV text (quotes, separators, formulas, odd line ends) → never 5xx; a refused commit writes nothing', async () => {
    // The export's own header (shared/schemas/fluids.ts fluidCsvColumns) and one good line, then spoiled.
    const header = 'name,kind,reference_temperature,density,expansion,surface_tension,surface_tension_slope,conductivity,heat_capacity,viscosity_points';
    const good = 'Fuzz solvent,solvent,20 °C,790 kg/m³,0.001 1/K,22 mN/m,-0.08 mN/(m·K),0.17 W/(m·K),2.4 kJ/(kg·K),20 °C = 1.2 mPa·s';
    const cell = fc.oneof(hostileString, fc.constantFrom(...QUANTITY_SPOILERS), fc.constantFrom('"', '""', '"a,b"', ',', '\r', '\n', '\r\n', '\uFEFF', "'=1+2", '=1+2', 'solvent', '20 °C'));
    const line = fc.array(cell, { minLength: 0, maxLength: 12 }).map((cells) => cells.join(','));
    const csvText = fc.oneof(
      fc.tuple(fc.array(line, { maxLength: 5 }), fc.constantFrom('\n', '\r\n', '\r')).map(([lines, end]) => [header, good, ...lines].join(end)),
      fc.array(line, { minLength: 1, maxLength: 5 }).map((lines) => lines.join('\n')),
      fc.string({ maxLength: 300 }),
    );
    const failures: Outcome[] = [];
    for (const key of ['POST /api/fluids/import/preview', 'POST /api/fluids/import/commit']) {
      const route = routeRegistry.get(key);
      expect(route, key).toBeDefined();
      await fc.assert(
        fc.asyncProperty(csvText, async (csv) => {
          const outcome = await sendOnce(route!, { param: '', query: '', body: JSON.stringify({ csv }) });
          if (outcome.status < 0 || outcome.status >= 500) failures.push({ ...outcome, detail: `${JSON.stringify(csv).slice(0, 120)}: ${outcome.detail}` });
        }),
        { numRuns: RUNS_PER_ROUTE * 8, seed: 1_958, endOnFailure: true },
      );
    }
    expect(failures).toEqual([]);
  }, 600_000);

  it('refuses a JSON body over the 1 MB limit with 413 on every JSON route, writing nothing', async () => {
    const huge = JSON.stringify({ notes: 'x'.repeat(1_100_000) });
    const failures: Outcome[] = [];
    for (const route of fuzzableRoutes().filter((r) => r.method !== 'get')) {
      const outcome = await sendOnce(route, { param: '00000000-0000-4000-8000-000000000000', query: '', body: huge });
      // 401/403 never happen here (allowed role); 413 unless the route reads no JSON body at all.
      if (outcome.status !== 413) failures.push(outcome);
    }
    expect(failures).toEqual([]);
  }, 300_000);
});
