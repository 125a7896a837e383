import type { Database } from '../db/client';
import type { Logger } from '../logger';
import { loadJobsEnv } from './jobs-env';
import { registerSpreadQueue } from './spread-queue-registry';
import { startJobs } from './start-jobs';

/**
 * The hook startServer calls: start the job queue and worker unless JOBS_ENABLED=false, register
 * the queue for the routes, and return how to stop it (a no-op when it was not started).
 */
export async function startServerJobs(options: { databaseUrl: string; db: Database; logger: Logger }): Promise<{ stop(): Promise<void> }> {
  const settings = loadJobsEnv();
  if (!settings.enabled) {
    options.logger.info('job queue disabled (JOBS_ENABLED=false): large property spreads wait for a worker');
    return { stop: async () => {} };
  }
  let jobs;
  try {
    jobs = await startJobs({ ...options, chunkPauseMs: settings.chunkPauseMs });
  } catch (error) {
    // The web app still serves everything else; queued spreads wait for the next worker that starts.
    options.logger.error({ err: error }, 'job queue could not start: large property spreads wait for a worker');
    return { stop: async () => {} };
  }
  registerSpreadQueue(jobs);
  return {
    async stop() {
      registerSpreadQueue(null);
      await jobs.stop();
    },
  };
}
