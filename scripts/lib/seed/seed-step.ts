import type { Database } from '../../../server/db/client';

/** What every seed step receives. */
export interface SeedContext {
  db: Database;
  /** bcrypt cost for any password the step hashes (BCRYPT_COST, default 12). */
  bcryptCost: number;
  log: (message: string) => void;
}

/**
 * One independent piece of the demo scenario (users, fluids, checks, …).
 * A step only inserts, with ON CONFLICT DO NOTHING semantics: it never updates or deletes a row,
 * so running it again, or after people changed the data, leaves their changes alone.
 */
export interface SeedStep {
  name: string;
  /** Returns how many rows it inserted now (0 on a re-run). */
  run(context: SeedContext): Promise<number>;
}
