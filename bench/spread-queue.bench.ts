/**
 * Property spread through the job queue (standalone; `npm run bench -- spread-queue`).
 * 1,000,000 samples of the Larkspur weld-cell check (invented demo; its margin has a validated
 * response surface) go through pg-boss exactly as the API sends them: a queued spread, one job, the
 * worker thread sampling 50,000-sample chunks, each chunk stored with the progress. Prints the
 * throughput (samples/s), the time to the first stored chunk and the time to the finished result.
 * Bounded: after BENCH_SPREAD_QUEUE_LIMIT_S seconds (default 600) it stops and reports the partial rate.
 * Uses its own scratch database, dropped at the end. Exits 0 either way.
 */
import { cpus, loadavg } from 'node:os';
import { eq } from 'drizzle-orm';
import { createDatabaseIfMissing, databaseUrlFor, dropDatabase, migrateDatabase } from '../scripts/lib/database';
import { ensurePostgres } from '../scripts/lib/postgres';
import { runDemoSeed } from '../scripts/lib/seed/run-demo-seed';
import { LARKSPUR_WELD_CELL_DEMO } from '../shared/physics/melt-pool/larkspur-weld-cell-demo';
import { createDatabase } from '../server/db/client';
import { layerChecks, propertySpreads, users } from '../server/db/schema';
import { startPropertySpread } from '../server/features/property-spreads/property-spreads.service';
import { startJobs } from '../server/jobs/start-jobs';
import { createLogger } from '../server/logger';

const SAMPLES = 1_000_000;
const limitSeconds = Number(process.env.BENCH_SPREAD_QUEUE_LIMIT_S ?? 600);

async function main(): Promise<void> {
  const postgres = await ensurePostgres({ log: () => {} });
  const name = `ql_bench_spread_queue_${Date.now()}`;
  await createDatabaseIfMissing(postgres.adminUrl, name);
  const url = databaseUrlFor(postgres.adminUrl, name);
  const { db, pool } = createDatabase(url, { max: 4 });
  let jobs: Awaited<ReturnType<typeof startJobs>> | undefined;
  try {
    await migrateDatabase(url);
    await runDemoSeed(url, { bcryptCost: 4, log: () => {} });
    const [engineer] = await db.select().from(users).where(eq(users.email, 'engineer@larkspur.example'));
    const [check] = await db.select({ id: layerChecks.id }).from(layerChecks).where(eq(layerChecks.title, LARKSPUR_WELD_CELL_DEMO.check.title));
    jobs = await startJobs({ databaseUrl: url, db, logger: createLogger('warn') });

    const started = performance.now();
    const spread = await startPropertySpread(
      db,
      { id: engineer.id, email: engineer.email, displayName: engineer.displayName, role: engineer.role },
      check.id,
      { samples: SAMPLES, seed: 20_26 },
      { enqueue: jobs.enqueue },
    );
    let firstChunkMs: number | null = null;
    let row = (await db.select().from(propertySpreads).where(eq(propertySpreads.id, spread.id)))[0];
    while (row.status !== 'done' && row.status !== 'failed' && performance.now() - started < limitSeconds * 1000) {
      await new Promise((resolve) => setTimeout(resolve, 1000));
      row = (await db.select().from(propertySpreads).where(eq(propertySpreads.id, spread.id)))[0];
      if (firstChunkMs === null && row.evaluatedSamples > 0) firstChunkMs = performance.now() - started;
    }
    const seconds = (performance.now() - started) / 1000;
    const rate = row.evaluatedSamples / seconds;
    const evaluator = row.evaluator as { method?: string } | null;
    console.log(`machine: ${cpus().length} cores, load ${loadavg().map((l) => l.toFixed(1)).join(' / ')}`);
    console.log(`evaluator: ${evaluator?.method ?? 'unknown'}; chunk size ${row.chunkSize.toLocaleString('en-GB')} samples`);
    console.log(`first stored chunk after ${firstChunkMs === null ? '—' : `${(firstChunkMs / 1000).toFixed(1)} s`} (includes pg-boss polling and the worker thread start)`);
    if (row.status === 'done') {
      const result = row.result as { onsetProbability: number };
      console.log(`1,000,000 samples through the queue: ${seconds.toFixed(1)} s → ${Math.round(rate).toLocaleString('en-GB')} samples/s (onset probability ${(result.onsetProbability * 100).toPrecision(3)} %)`);
    } else {
      console.log(
        `STOPPED after ${seconds.toFixed(0)} s with status ${row.status}: ${row.evaluatedSamples.toLocaleString('en-GB')} of ${SAMPLES.toLocaleString('en-GB')} samples → partial rate ${Math.round(rate).toLocaleString('en-GB')} samples/s` +
          (row.error ? ` (${row.error})` : ''),
      );
    }
  } finally {
    await jobs?.stop();
    await pool.end();
    await dropDatabase(postgres.adminUrl, name).catch(() => {});
    await postgres.stop();
  }
}

main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
