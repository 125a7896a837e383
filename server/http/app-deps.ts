import type { Database } from '../db/client';
import type { Env } from '../env';
import type { Logger } from '../logger';
import type { InFlightWork } from './in-flight-work';

/** Throttle settings; tests pass their own so parallel files do not share one budget. */
export interface RateLimitSettings {
  windowMs: number;
  limit: number;
}

/** Everything the HTTP layer needs, passed to createApp (no module-level singletons). */
export interface AppDeps {
  db: Database;
  env: Env;
  logger: Logger;
  rateLimits: {
    /** Sign-in attempts per client address. */
    signIn: RateLimitSettings;
    /** Password-reset requests, reset confirmations and invitation acceptances per client address. */
    tokenUse: RateLimitSettings;
    /**
     * Start of every rate-limit key in the database. Processes with the same prefix share one budget
     * per address; an app with a prefix of its own (tests) counts apart from the others.
     */
    keyPrefix: string;
  };
  /** Route work still running (defineRoute counts every guarded route); shutdown waits for it. */
  inFlightWork: InFlightWork;
}
