import { z } from 'zod';

const schema = z.object({
  JOBS_ENABLED: z
    .enum(['true', 'false', '1', '0', 'yes', 'no'], { error: 'JOBS_ENABLED must be true or false' })
    .default('true')
    .transform((v) => v === 'true' || v === '1' || v === 'yes'),
  JOBS_CHUNK_PAUSE_MS: z.coerce.number().int().min(0).max(60_000, 'JOBS_CHUNK_PAUSE_MS must be at most 60000').default(0),
});

export interface JobsEnv {
  /** Start the job queue and its worker with the server (default true). */
  enabled: boolean;
  /** Pause after each stored spread chunk [ms] (default 0). */
  chunkPauseMs: number;
}

/** Job-queue settings from the environment (empty values count as unset). */
export function loadJobsEnv(source: Record<string, string | undefined> = process.env): JobsEnv {
  const cleaned = Object.fromEntries(Object.entries(source).filter(([k, v]) => k.startsWith('JOBS_') && v !== undefined && v !== ''));
  const parsed = schema.safeParse(cleaned);
  if (!parsed.success) throw new Error(`QuietLayer cannot start: ${parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
  return { enabled: parsed.data.JOBS_ENABLED, chunkPauseMs: parsed.data.JOBS_CHUNK_PAUSE_MS };
}
