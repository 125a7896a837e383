import type { Database } from '../db/client';
import type { Env } from '../env';
import type { Logger } from '../logger';

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
  };
}
