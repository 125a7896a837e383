import { rateLimit, type RateLimitRequestHandler } from 'express-rate-limit';
import type { AppDeps } from './app-deps';
import { PostgresRateLimitStore } from './postgres-rate-limit-store';

/** The limiters of AppDeps.rateLimits; the name is part of the store key, so each keeps its own count. */
export type AddressRateLimitName = 'signIn' | 'tokenUse';

/**
 * A per-client-address limiter that answers with the API error shape and Retry-After. Counts live
 * in PostgreSQL (rate_limit_hits), so every server process on the database shares one budget per
 * address; limiters built with the same name and key prefix share their count too.
 */
export function createAddressRateLimit(
  deps: Pick<AppDeps, 'db' | 'logger' | 'rateLimits'>,
  name: AddressRateLimitName,
): RateLimitRequestHandler {
  const settings = deps.rateLimits[name];
  return rateLimit({
    windowMs: settings.windowMs,
    limit: settings.limit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    store: new PostgresRateLimitStore(deps.db, { prefix: `${deps.rateLimits.keyPrefix}:${name}:`, windowMs: settings.windowMs }),
    // Fail open: when the database cannot count, the request goes on unthrottled instead of
    // becoming a 500. Passwords stay protected by the per-account lockout, which lives in the
    // users table, and a request that needs the database then answers 503 anyway (error handler,
    // server/middleware/db-unavailable.ts).
    passOnStoreError: true,
    logger: {
      error: (error, message) => deps.logger.warn({ err: error }, message ?? 'rate limit store error'),
      warn: (error, message) => deps.logger.warn({ err: error }, message ?? 'rate limit warning'),
    },
    handler: (_req, res, _next, options) => {
      res.status(options.statusCode).json({
        error: { code: 'too_many_requests', message: 'Too many attempts from this address. Please wait a little and try again.' },
      });
    },
  });
}
