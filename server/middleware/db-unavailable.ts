import type { RequestHandler } from 'express';
import pg from 'pg';

/** How long an /api request may go unanswered before we ask whether the database still answers. */
export const DATABASE_WAIT_MS = 5_000;
/** Limits of that question: connecting, and running `select 1`. */
const PROBE_TIMEOUT_MS = 3_000;
/** One probe answers every waiting request for this long. */
const PROBE_REUSE_MS = 1_000;

const UNAVAILABLE = {
  error: { code: 'unavailable', message: 'The database cannot be reached just now. Please try again shortly.' },
};

/** Asks PostgreSQL `select 1` on a connection of its own (the pool may be full of stuck clients). */
export async function probeDatabase(databaseUrl: string, timeoutMs = PROBE_TIMEOUT_MS): Promise<boolean> {
  const client = new pg.Client({ connectionString: databaseUrl, connectionTimeoutMillis: timeoutMs, query_timeout: timeoutMs });
  client.on('error', () => {});
  try {
    await client.connect();
    await client.query('select 1');
    return true;
  } catch {
    return false;
  } finally {
    void client.end().catch(() => {});
  }
}

/**
 * Fail fast when the database stops answering without refusing (a frozen server, a network black
 * hole). A stopped PostgreSQL already fails fast (connection refused → the error handler's 503), and
 * new connections give up after the pool's 2 s connection timeout; but a query sent on a connection
 * that was open before the freeze waits for ever. So: when an /api request has not been answered
 * after `waitMs`, probe the database on a fresh connection; if it does not answer either, reply 503
 * 'unavailable' now. A request that is merely slow (long computation) while the database answers is
 * left alone and checked again after another `waitMs`.
 */
export function databaseUnavailableGuard(options: { databaseUrl: string; waitMs?: number; probe?: () => Promise<boolean> }): RequestHandler {
  const waitMs = options.waitMs ?? DATABASE_WAIT_MS;
  const probe = options.probe ?? (() => probeDatabase(options.databaseUrl));
  let shared: { at: number; answer: Promise<boolean> } | null = null;
  const databaseAnswers = () => {
    const now = Date.now();
    if (!shared || now - shared.at > PROBE_REUSE_MS) shared = { at: now, answer: probe() };
    return shared.answer;
  };

  return (req, res, next) => {
    if (!req.path.startsWith('/api')) return next();
    let timer: NodeJS.Timeout | undefined;
    const answered = () => res.headersSent || res.writableEnded || res.destroyed;
    const check = async () => {
      if (answered()) return;
      const up = await databaseAnswers();
      if (answered()) return;
      if (up) {
        arm();
        return;
      }
      req.log?.error({ waitedMs: waitMs }, 'database does not answer; request answered 503');
      res.status(503).json(UNAVAILABLE);
    };
    const arm = () => {
      timer = setTimeout(() => void check(), waitMs);
      timer.unref();
    };
    const disarm = () => clearTimeout(timer);
    res.once('finish', disarm);
    res.once('close', disarm);
    arm();
    next();
  };
}
