/**
 * One Express app per test file, on the run's database (tests/setup/global-setup.ts sets
 * DATABASE_URL, QUIETLAYER_MODE=demo, BCRYPT_COST=4 and SESSION_SECRET before workers start).
 */
import type { Express } from 'express';
import { createApp, type CreateAppDeps } from '../../../server/app';
import { createDatabase, type Database } from '../../../server/db/client';
import { loadEnv, type Env } from '../../../server/env';
import { createLogger } from '../../../server/logger';
import type { Pool } from 'pg';

export interface TestContext {
  app: Express;
  db: Database;
  pool: Pool;
  env: Env;
  close(): Promise<void>;
}

/** Generous throttles unless a test asks for tight ones: files share 127.0.0.1. */
const RELAXED_LIMITS = { signIn: { windowMs: 60_000, limit: 10_000 }, tokenUse: { windowMs: 60_000, limit: 10_000 } };

export function createTestContext(
  options: { env?: Record<string, string | undefined>; databaseUrl?: string } & Pick<CreateAppDeps, 'rateLimits' | 'clientDir'> = {},
): TestContext {
  const env = loadEnv({
    ...process.env,
    ...(options.databaseUrl ? { DATABASE_URL: options.databaseUrl } : {}),
    PUBLIC_URL: 'http://quietlayer.test',
    ...options.env,
  });
  const { db, pool } = createDatabase(env.DATABASE_URL, { max: 4 });
  const app = createApp({
    db,
    env,
    logger: createLogger('silent'),
    rateLimits: { ...RELAXED_LIMITS, ...options.rateLimits },
    clientDir: options.clientDir ?? '/nonexistent-quietlayer-client',
  });
  return { app, db, pool, env, close: () => pool.end() };
}
