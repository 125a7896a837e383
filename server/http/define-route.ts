/**
 * Every /api route is registered through `defineRoute`. It runs, before the handler:
 *   1. load the sealed session cookie,
 *   2. for non-public actions: refuse (401) a missing, expired or inactive-user session,
 *   3. check the action against server/auth/policy.ts (403 when the role is not listed;
 *      an action missing from the policy is refused for everyone).
 * The whole of that (and the handler) is counted in `deps.inFlightWork`, so shutdown waits for it.
 * It also records the route in `routeRegistry`, which the role-matrix test walks, and marks
 * the handler so `assertEveryApiRouteIsDefined` can catch routes added to Express directly.
 *
 * @example
 * defineRoute(api, {
 *   method: 'get', path: '/api/fluids/:id', action: 'fluids.read',
 *   handler: async (req, res, ctx) => { res.json(await getFluid(ctx.db, idParam.parse(req.params).id)); },
 * });
 */
import express, { type Express, type Request, type Response, type Router } from 'express';
import { loadSessionUser, type CurrentUser } from '../auth/current-user';
import { isAllowed, isPublicAction, ruleFor, type Action, type policy } from '../auth/policy';
import { isSessionExpired, loadSession, sessionOptions, type Session } from '../auth/session';
import { ForbiddenError, UnauthenticatedError } from '../errors';
import type { AppDeps } from './app-deps';

export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** A router plus the dependencies its routes need. Create one per app with `createApiRouter`. */
export interface ApiRouter {
  router: Router;
  deps: AppDeps;
}

export function createApiRouter(deps: AppDeps): ApiRouter {
  return { router: express.Router(), deps };
}

type IsPublic<A extends Action> = (typeof policy)[A] extends 'public' ? true : false;

export interface RouteContext<A extends Action> extends AppDeps {
  session: Session;
  /** The signed-in person on non-public routes; always null on public routes (they do not load the user). */
  user: IsPublic<A> extends true ? CurrentUser | null : CurrentUser;
  requestId: string;
}

export interface RouteSpec<A extends Action> {
  method: HttpMethod;
  /** The full path, starting with /api. */
  path: `/api/${string}` | '/api';
  action: A;
  handler: (req: Request, res: Response, ctx: RouteContext<A>) => Promise<void> | void;
  /** Optional middleware run before session loading (e.g. a rate limiter). */
  before?: express.RequestHandler[];
}

export interface RegisteredRoute {
  method: HttpMethod;
  path: string;
  action: Action;
}

/** Every route registered through defineRoute, keyed `METHOD path` (the same across app instances). */
export const routeRegistry = new Map<string, RegisteredRoute>();

const DEFINED_ROUTE = Symbol.for('quietlayer.definedRoute');

export function defineRoute<A extends Action>(api: ApiRouter, spec: RouteSpec<A>): void {
  if (!spec.path.startsWith('/api')) throw new Error(`defineRoute: path must start with /api, got ${spec.path}`);
  if (ruleFor(spec.action) === undefined) throw new Error(`defineRoute: action ${spec.action} is not in server/auth/policy.ts`);
  const key = `${spec.method.toUpperCase()} ${spec.path}`;
  const existing = routeRegistry.get(key);
  if (existing && existing.action !== spec.action) {
    throw new Error(`defineRoute: ${key} registered twice with different actions (${existing.action}, ${spec.action})`);
  }
  routeRegistry.set(key, { method: spec.method, path: spec.path, action: spec.action });

  const { deps } = api;
  const options = sessionOptions(deps.env);

  const runGuarded = async (req: Request, res: Response) => {
    const session = await loadSession(req, res, options);
    let user: CurrentUser | null = null;
    // Public routes never touch the users table, so /api/health still answers with a cookie
    // while the database is down; their handlers get user = null.
    if (!isPublicAction(spec.action) && session.userId) {
      if (isSessionExpired(session, deps.env.SESSION_TTL_SECONDS)) {
        session.destroy();
      } else {
        user = await loadSessionUser(deps.db, session.userId, session.issuedAt as number, session.sessionId);
        if (!user) session.destroy();
      }
    }
    if (!isPublicAction(spec.action)) {
      if (!user) throw new UnauthenticatedError('Please sign in.');
      if (!isAllowed(spec.action, user.role)) throw new ForbiddenError();
    }
    res.locals.user = user;
    const ctx = { ...deps, session, user, requestId: String(req.id ?? '') } as RouteContext<A>;
    await spec.handler(req, res, ctx);
  };
  // The whole body (session, user lookup, handler) is counted in deps.inFlightWork: a client that
  // disconnects does not stop it, and shutdown must not close the pool under it (server/index.ts).
  const guarded = (req: Request, res: Response) => deps.inFlightWork.run(() => runGuarded(req, res));
  Object.defineProperty(guarded, DEFINED_ROUTE, { value: true });
  api.router[spec.method](spec.path, ...(spec.before ?? []), guarded);
}

interface StackLayer {
  route?: { path: string; stack: { handle: unknown }[] };
  handle?: { stack?: StackLayer[] };
  match?: (path: string) => boolean;
}

/**
 * Startup check: every Express route whose path is under /api must have been registered
 * with defineRoute. Throws, naming the offenders, so a forgotten policy check cannot ship.
 */
export function assertEveryApiRouteIsDefined(app: Express): void {
  const offenders: string[] = [];
  const walk = (stack: StackLayer[], underApi: boolean) => {
    for (const layer of stack) {
      if (layer.route) {
        const isApi = underApi || layer.route.path.startsWith('/api');
        const defined = layer.route.stack.some((l) => typeof l.handle === 'function' && DEFINED_ROUTE in (l.handle as object));
        if (isApi && !defined) offenders.push(layer.route.path);
      } else if (layer.handle?.stack) {
        // A router mounted at "/" matches everything: its routes are judged by their own paths.
        const matches = (path: string) => typeof layer.match === 'function' && layer.match(path);
        const mountedUnderApi = underApi || (matches('/api/__probe__') && !matches('/__not_api__/__probe__'));
        walk(layer.handle.stack, mountedUnderApi);
      }
    }
  };
  walk((app.router as unknown as { stack: StackLayer[] }).stack, false);
  if (offenders.length > 0) {
    throw new Error(`These /api routes bypass defineRoute (no session/policy check): ${offenders.join(', ')}`);
  }
}
