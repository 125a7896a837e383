import PgBoss from 'pg-boss';
import type { Database } from '../db/client';
import type { Logger } from '../logger';
import { findUnfinishedSpreadIds } from '../features/property-spreads/property-spreads.repository';
import { runQueuedSpread, SpreadInterruptedError } from '../features/property-spreads/run-queued-spread';
import type { OpenSpreadCompute } from './spread-compute';
import { openInlineSpreadCompute } from './spread-compute-inline';
import { openThreadSpreadCompute } from './spread-compute-thread';
import type { SpreadQueue } from './spread-queue-registry';

/** The pg-boss queue that runs large Property spreads. */
export const SPREAD_QUEUE = 'property-spread';

/** Retries cover restarts (a stopped worker fails its job; the job is retried by the next worker). */
const QUEUE_OPTIONS = { retryLimit: 20, retryDelay: 1, retryBackoff: false, expireInSeconds: 15 * 60 } as const;

export interface StartedJobs extends SpreadQueue {
  /** Stop taking jobs, interrupt the running spread after its current chunk, and close the queue's connections. */
  stop(): Promise<void>;
}

/**
 * Starts pg-boss on the app's database and a worker for Property spreads.
 *
 * - A job carries only the spread id; the spread's plan and stored chunks live in property_spreads.
 * - On stop, the running spread ends after its current chunk and its job is failed, so pg-boss
 *   retries it: the next worker (this process after a restart, or another process) continues from
 *   the stored chunks. A worker that dies without stopping leaves its job active until pg-boss
 *   expires it (15 min) and retries it.
 * - On start, every spread still queued or running without a pending job is sent again, so a spread
 *   stored while no queue was running (JOBS_ENABLED=false) is not forgotten.
 */
export async function startJobs(options: { databaseUrl: string; db: Database; logger: Logger; chunkPauseMs?: number }): Promise<StartedJobs> {
  const { db, logger } = options;
  const boss = new PgBoss({ connectionString: options.databaseUrl, max: 3, application_name: 'quietlayer-jobs' });
  boss.on('error', (error) => logger.warn({ err: error }, 'job queue error'));
  await boss.start();
  if (!(await boss.getQueue(SPREAD_QUEUE))) {
    try {
      await boss.createQueue(SPREAD_QUEUE, { name: SPREAD_QUEUE, ...QUEUE_OPTIONS });
    } catch (error) {
      // Another process created it at the same moment.
      if (!(await boss.getQueue(SPREAD_QUEUE))) throw error;
    }
  }

  // Samples are computed in a worker thread so the web server in this process keeps answering;
  // if a thread cannot start (an unusual runtime), the run falls back to this thread.
  const openCompute: OpenSpreadCompute = async (plan, layer) => {
    try {
      return await openThreadSpreadCompute(plan, layer);
    } catch (error) {
      if (error instanceof RangeError) throw error;
      logger.warn({ err: error }, 'spread worker thread could not start; sampling in the main thread');
      return openInlineSpreadCompute(plan, layer);
    }
  };

  let stopping = false;
  const enqueue = async (spreadId: string) => {
    await boss.send(SPREAD_QUEUE, { spreadId }, { ...QUEUE_OPTIONS });
  };

  await boss.work<{ spreadId: string }>(SPREAD_QUEUE, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
    const { spreadId } = job.data;
    try {
      const outcome = await runQueuedSpread(db, spreadId, { shouldStop: () => stopping, pauseBetweenChunksMs: options.chunkPauseMs, openCompute });
      logger.info({ spreadId, outcome }, 'property spread job finished');
    } catch (error) {
      if (error instanceof SpreadInterruptedError) logger.info({ spreadId }, error.message);
      else logger.error({ err: error, spreadId }, 'property spread job failed; it will be retried');
      throw error;
    }
  });

  // Spreads left queued or running with no job waiting for them get one now.
  const unfinished = await findUnfinishedSpreadIds(db);
  if (unfinished.length > 0) {
    const pending = await pendingSpreadIds(boss);
    for (const id of unfinished) if (!pending.has(id)) await enqueue(id);
  }

  return {
    enqueue,
    async stop() {
      stopping = true;
      await boss.stop({ graceful: true, timeout: 15_000, wait: true });
    },
  };
}

/** Spread ids that already have a job waiting, retrying or running. */
async function pendingSpreadIds(boss: PgBoss): Promise<Set<string>> {
  const db = boss.getDb() as { executeSql(text: string, values?: unknown[]): Promise<{ rows: { id: string }[] }> };
  const { rows } = await db.executeSql(
    `select data->>'spreadId' as id from pgboss.job where name = $1 and state in ('created', 'retry', 'active')`,
    [SPREAD_QUEUE],
  );
  return new Set(rows.map((r) => r.id));
}
