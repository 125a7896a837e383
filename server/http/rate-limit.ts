import { rateLimit, type RateLimitRequestHandler } from 'express-rate-limit';
import type { RateLimitSettings } from './app-deps';

/**
 * A per-client-address limiter that answers with the API error shape and Retry-After.
 * The store is in memory, so each server process counts on its own (see README, scaling).
 */
export function createAddressRateLimit(settings: RateLimitSettings): RateLimitRequestHandler {
  return rateLimit({
    windowMs: settings.windowMs,
    limit: settings.limit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: (_req, res, _next, options) => {
      res.status(options.statusCode).json({
        error: { code: 'too_many_requests', message: 'Too many attempts from this address. Please wait a little and try again.' },
      });
    },
  });
}
