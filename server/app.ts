import { randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import express, { type Express } from 'express';
import { pinoHttp } from 'pino-http';
import type { Database } from './db/client';
import type { Env } from './env';
import { createLogger, type Logger } from './logger';
import type { AppDeps, RateLimitSettings } from './http/app-deps';
import { assertEveryApiRouteIsDefined, createApiRouter } from './http/define-route';
import { createInFlightWork, type InFlightWork } from './http/in-flight-work';
import { createErrorHandler } from './middleware/error-handler';
import { apiNotFound } from './middleware/not-found';
import { csrfOriginCheck } from './middleware/csrf';
import { databaseUnavailableGuard } from './middleware/db-unavailable';
import { securityHeaders } from './middleware/security-headers';
import { registerAuditRoutes } from './features/audit/audit.routes';
import { registerAuthRoutes } from './features/auth/auth.routes';
import { registerConfigRoutes } from './features/config/config.routes';
import { registerHealthRoutes } from './features/health/health.routes';
import { registerInvitationsRoutes } from './features/invitations/invitations.routes';
import { registerOutboxRoutes } from './features/outbox/outbox.routes';
import { registerUsersRoutes } from './features/users/users.routes';
import { registerFluidsRoutes } from './features/fluids/fluids.routes';
import { registerLayerChecksRoutes } from './features/layer-checks/layer-checks.routes';
import { registerSheetsRoutes } from './features/sheets/sheets.routes';
import { registerDryingPathsRoutes } from './features/drying-paths/drying-paths.routes';
import { registerPropertySpreadsRoutes } from './features/property-spreads/property-spreads.routes';
import { registerMeltPoolRoutes } from './features/melt-pool/melt-pool.routes';
import { registerBatchRoutes } from './features/batch/batch.routes';
import { registerGaugeLogRoutes } from './features/gauge-log/gauge-log.routes';

/** Largest JSON body accepted; bigger ones get 413 'payload_too_large'. */
export const JSON_BODY_LIMIT = '1mb';

/**
 * Defaults: 20 sign-in attempts and 30 token uses per client address per 15 minutes, counted in the
 * database under one key prefix so every server process shares them.
 */
export const DEFAULT_RATE_LIMITS: AppDeps['rateLimits'] = {
  signIn: { windowMs: 15 * 60 * 1000, limit: 20 },
  tokenUse: { windowMs: 15 * 60 * 1000, limit: 30 },
  keyPrefix: 'quietlayer',
};

export interface CreateAppDeps {
  db: Database;
  env: Env;
  logger?: Logger;
  /**
   * Own throttles (tests). Without a keyPrefix they get a random one, so their counts in the shared
   * database start from zero and no other app's requests from the same address use them up.
   */
  rateLimits?: Partial<{ signIn: RateLimitSettings; tokenUse: RateLimitSettings; keyPrefix: string }>;
  /** Folder with the built client (index.html); defaults to <project>/dist/client. Served only if it exists. */
  clientDir?: string;
  /** Tracker of running route work; startServer passes its own so shutdown can wait for it. */
  inFlightWork?: InFlightWork;
}

const REQUEST_ID = /^[\w.:-]{1,100}$/;
const defaultClientDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'dist', 'client');

/** Builds the Express app (middleware, every route, error handler). Never listens. */
export function createApp(input: CreateAppDeps): Express {
  const logger = input.logger ?? createLogger(input.env.LOG_LEVEL);
  const deps: AppDeps = {
    db: input.db,
    env: input.env,
    logger,
    rateLimits: {
      signIn: input.rateLimits?.signIn ?? DEFAULT_RATE_LIMITS.signIn,
      tokenUse: input.rateLimits?.tokenUse ?? DEFAULT_RATE_LIMITS.tokenUse,
      keyPrefix: input.rateLimits?.keyPrefix ?? (input.rateLimits ? `app-${randomUUID()}` : DEFAULT_RATE_LIMITS.keyPrefix),
    },
    inFlightWork: input.inFlightWork ?? createInFlightWork(),
  };

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', input.env.TRUST_PROXY);
  app.use(securityHeaders(input.env));
  app.use(
    pinoHttp({
      logger,
      genReqId: (req, res) => {
        const incoming = req.headers['x-request-id'];
        const id = typeof incoming === 'string' && REQUEST_ID.test(incoming) ? incoming : randomUUID();
        res.setHeader('X-Request-Id', id);
        return id;
      },
      // Who made the request, once defineRoute has loaded the session (read when the response ends).
      customProps: (_req, res) => ({ userId: (res as express.Response).locals?.user?.id }),
      customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info'),
    }),
  );
  app.use(databaseUnavailableGuard({ databaseUrl: input.env.DATABASE_URL }));
  app.use(csrfOriginCheck(input.env));
  app.use(express.json({ limit: JSON_BODY_LIMIT }));

  const api = createApiRouter(deps);
  registerHealthRoutes(api);
  registerConfigRoutes(api);
  registerAuthRoutes(api);
  registerInvitationsRoutes(api);
  registerUsersRoutes(api);
  registerAuditRoutes(api);
  registerOutboxRoutes(api);
  registerFluidsRoutes(api);
  registerLayerChecksRoutes(api);
  registerSheetsRoutes(api);
  registerDryingPathsRoutes(api);
  registerPropertySpreadsRoutes(api);
  registerMeltPoolRoutes(api);
  registerBatchRoutes(api);
  registerGaugeLogRoutes(api);
  app.use(api.router);
  app.use('/api', apiNotFound);

  const clientDir = input.clientDir ?? defaultClientDir;
  const indexHtml = path.join(clientDir, 'index.html');
  if (existsSync(indexHtml)) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // Client-side routes (/admin/users, /accept-invitation, …) all load the single page.
    app.get('/{*splat}', (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(indexHtml);
    });
  }

  app.use(createErrorHandler(logger));
  assertEveryApiRouteIsDefined(app);
  return app;
}
