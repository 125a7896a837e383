import { createDatabase } from '../../../server/db/client';
import { demoSeedSteps } from './demo-seed-steps';
import type { SeedStep } from './seed-step';

export interface RunDemoSeedOptions {
  bcryptCost?: number;
  log?: (message: string) => void;
  steps?: SeedStep[];
}

/** Runs every demo seed step against the database at `databaseUrl`; returns rows inserted per step. */
export async function runDemoSeed(databaseUrl: string, options: RunDemoSeedOptions = {}): Promise<Record<string, number>> {
  const log = options.log ?? ((message: string) => console.log(message));
  const bcryptCost = options.bcryptCost ?? bcryptCostFromEnv();
  const { db, pool } = createDatabase(databaseUrl, { max: 4 });
  const inserted: Record<string, number> = {};
  try {
    for (const step of options.steps ?? demoSeedSteps) {
      inserted[step.name] = await step.run({ db, bcryptCost, log });
    }
  } finally {
    await pool.end();
  }
  return inserted;
}

function bcryptCostFromEnv(): number {
  const raw = process.env.BCRYPT_COST;
  if (raw === undefined || raw === '') return 12;
  const cost = Number(raw);
  if (!Number.isInteger(cost) || cost < 4 || cost > 15) throw new Error(`BCRYPT_COST must be a whole number from 4 to 15, got "${raw}"`);
  return cost;
}
