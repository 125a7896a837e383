/**
 * List benchmark (standalone; `npm run bench -- list-checks`): 10,000 layer checks in a scratch
 * database, then the median time of GET /api/layer-checks pages (in-process HTTP through the full
 * Express app: session, policy, query, JSON) against the design target of ≤ 100 ms per page.
 * Prints the medians; exits 0 either way, a miss printed as MISSED. Drops the scratch database.
 */
import { randomBytes } from 'node:crypto';
import bcrypt from 'bcryptjs';
import request from 'supertest';
import { createDatabaseIfMissing, databaseUrlFor, dropDatabase, migrateDatabase } from '../scripts/lib/database';
import { demoFluidInputs } from '../scripts/lib/seed/demo-fluids';
import { createApp } from '../server/app';
import { createDatabase } from '../server/db/client';
import { fluids } from '../server/db/schema/fluids';
import { layerChecks } from '../server/db/schema/layer-checks';
import { users } from '../server/db/schema/users';
import { loadEnv } from '../server/env';
import { fluidColumns } from '../server/features/fluids/fluid-records';
import { createLogger } from '../server/logger';
import { readFluidInput } from '../shared/fluids/read-fluid-input';
import { fluidInputSchema } from '../shared/schemas/fluids';
import { layerCheckInputSchema, processKindValues } from '../shared/schemas/layer-checks';

const CHECKS = 10_000;
const TARGET_MS = 100;
const adminUrl = process.env.QUIETLAYER_BENCH_ADMIN_URL ?? 'postgres://postgres@127.0.0.1:54329/postgres';
const name = `quietlayer_bench_list_${randomBytes(3).toString('hex')}`;

function median(samples: number[]): number {
  const sorted = [...samples].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

async function main(): Promise<void> {
  await createDatabaseIfMissing(adminUrl, name);
  const url = databaseUrlFor(adminUrl, name);
  const { db, pool } = createDatabase(url, { max: 4 });
  try {
    await migrateDatabase(url);
    const password = 'bench-password';
    const [user] = await db
      .insert(users)
      .values({ email: 'bench@larkspur.example', displayName: 'Bench engineer', role: 'engineer', passwordHash: await bcrypt.hash(password, 4) })
      .returning();
    const fluidIds: string[] = [];
    for (const input of demoFluidInputs()) {
      const read = readFluidInput(fluidInputSchema.parse(input));
      if (!read.ok) throw new Error(`bench fluid ${input.name} invalid`);
      const [row] = await db.insert(fluids).values(fluidColumns(read.fluid)).returning({ id: fluids.id });
      fluidIds.push(row.id);
    }
    const insertStart = performance.now();
    for (let start = 0; start < CHECKS; start += 1000) {
      const rows = Array.from({ length: Math.min(1000, CHECKS - start) }, (_, k) => {
        const i = start + k;
        const depthMicrons = 10 + (i % 490);
        const input = layerCheckInputSchema.parse({
          title: `Line ${1 + (i % 7)} check ${i}`,
          fluidId: fluidIds[i % fluidIds.length],
          processKind: processKindValues[i % processKindValues.length],
          temperature: '40 °C',
          depth: `${depthMicrons} µm`,
          bottom: { mechanics: 'rigid', thermal: 'conducting' },
          top: 'surface',
          heating: { mode: 'deltaT', deltaT: '2 K' },
        });
        return {
          title: input.title,
          processKind: input.processKind,
          fluidId: input.fluidId,
          ownerId: user.id,
          input,
          depthText: input.depth,
          depthSi: depthMicrons * 1e-6,
          // Stored margins vary with the row so sorting by margin has work to do.
          savedMargin: i % 13 === 0 ? null : 0.2 + ((i * 7919) % 1000) / 250,
          savedRegime: 'quiet',
        };
      });
      await db.insert(layerChecks).values(rows);
    }
    await pool.query('ANALYZE');
    console.log(`inserted ${CHECKS} checks in ${((performance.now() - insertStart) / 1000).toFixed(1)} s`);

    const env = loadEnv({ ...process.env, DATABASE_URL: url, NODE_ENV: 'test', QUIETLAYER_MODE: 'demo', LOG_LEVEL: 'silent' });
    const app = createApp({ db, env, logger: createLogger('silent'), clientDir: '/nonexistent-quietlayer-client' });
    const agent = request.agent(app);
    const signIn = await agent.post('/api/auth/sign-in').send({ email: 'bench@larkspur.example', password });
    if (signIn.status !== 200) throw new Error(`bench sign-in failed: ${signIn.status}`);

    const scenarios: Array<[string, Record<string, string | number>]> = [
      ['newest first, page 1', { pageSize: 50 }],
      ['newest first, page 150', { pageSize: 50, page: 150 }],
      ['by margin ascending, page 1', { pageSize: 50, sort: 'margin', dir: 'asc' }],
      ['by title, filtered "Line 3", page 5', { pageSize: 50, sort: 'title', q: 'Line 3', page: 5 }],
      ['drying coats by depth, page 10', { pageSize: 50, processKind: 'drying-coat', sort: 'depth', page: 10 }],
      ['200 rows a page', { pageSize: 200, page: 20 }],
    ];
    let worst = 0;
    for (const [label, query] of scenarios) {
      const samples: number[] = [];
      for (let run = 0; run < 23; run += 1) {
        const started = performance.now();
        const res = await agent.get('/api/layer-checks').query(query);
        const elapsed = performance.now() - started;
        if (res.status !== 200 || res.body.total < 1) throw new Error(`${label}: ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`);
        if (run >= 3) samples.push(elapsed); // first runs warm the JIT and the pool
      }
      const m = median(samples);
      worst = Math.max(worst, m);
      console.log(`  ${label.padEnd(40)} median ${m.toFixed(1)} ms  ${m <= TARGET_MS ? 'ok' : 'MISSED'}`);
    }
    console.log(`list page with ${CHECKS} checks: worst median ${worst.toFixed(1)} ms (target ≤ ${TARGET_MS} ms) ${worst <= TARGET_MS ? 'ok' : `MISSED ×${(worst / TARGET_MS).toFixed(1)}`}`);
  } finally {
    await pool.end();
    await dropDatabase(adminUrl, name);
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
