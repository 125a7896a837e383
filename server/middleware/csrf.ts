import type { Request, RequestHandler } from 'express';
import type { Env } from '../env';
import { AppError } from '../errors';

/** Methods that change state; GET/HEAD/OPTIONS never do in QuietLayer. */
const UNSAFE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

export class CrossSiteRequestError extends AppError {
  constructor() {
    super(403, 'csrf', 'This request came from another site and was refused. Reload QuietLayer and try again.');
  }
}

function originOf(value: string): string | null {
  try {
    const url = new URL(value);
    return url.protocol === 'http:' || url.protocol === 'https:' ? url.origin : null;
  } catch {
    return null;
  }
}

/** The origins that count as "this app": PUBLIC_URL's, and the one the request itself was addressed to. */
function ownOrigins(req: Request, publicOrigin: string | null): Set<string> {
  const own = new Set<string>();
  if (publicOrigin) own.add(publicOrigin);
  const host = req.headers.host;
  if (host) own.add(`${req.protocol}://${host}`.toLowerCase());
  return own;
}

/**
 * Cross-site request forgery guard for cookie-authenticated changes (OWASP Cheat Sheet Series,
 * "Cross-Site Request Forgery Prevention": verifying origin with standard headers, and Fetch Metadata).
 *
 * For POST/PUT/PATCH/DELETE under /api, refuse with 403 code 'csrf' when
 *   - `Sec-Fetch-Site: cross-site` (the browser says another site started it), or
 *   - `Origin` names another origin than the app's own (PUBLIC_URL or the Host the request was sent to),
 *     including the opaque `Origin: null`, or
 *   - `Origin` is absent and `Referer` names another origin.
 * The session cookie is SameSite=Lax as a second layer. Requests carrying an `Authorization` header
 * (bearer-token device clients) are exempt: a browser never attaches one cross-site on its own.
 * Requests with neither Origin nor Referer (command-line clients) pass: browsers send Origin on
 * every cross-origin POST. Public routes are covered too, which also stops sign-in forgery.
 */
export function csrfOriginCheck(env: Pick<Env, 'PUBLIC_URL'>): RequestHandler {
  const publicOrigin = originOf(env.PUBLIC_URL);
  return (req, _res, next) => {
    if (!UNSAFE_METHODS.has(req.method) || !req.path.startsWith('/api')) return next();
    if (typeof req.headers.authorization === 'string' && /^bearer\s/i.test(req.headers.authorization)) return next();

    if (req.headers['sec-fetch-site'] === 'cross-site') return next(new CrossSiteRequestError());
    const origin = req.headers.origin;
    const referer = req.headers.referer;
    const claimed = typeof origin === 'string' ? origin : typeof referer === 'string' ? referer : undefined;
    if (claimed === undefined) return next();
    const claimedOrigin = originOf(claimed);
    if (claimedOrigin === null || !ownOrigins(req, publicOrigin).has(claimedOrigin)) return next(new CrossSiteRequestError());
    next();
  };
}
