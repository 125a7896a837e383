/**
 * Counts route work that is still running, so shutdown can wait for it before closing the pool.
 *
 * Why the HTTP server alone is not enough: `server.close()` resolves once every connection is
 * gone, but a client that disconnects (a closed tab, a load generator that gives up) does not
 * stop the handler serving it. That handler keeps awaiting the database after its socket is
 * closed; if shutdown then calls `pool.end()`, its next query fails with "Cannot use a pool
 * after calling end on the pool" and is logged as a 500. defineRoute runs every guarded route
 * body through `run`, and `startServer().close()` waits for `settled()` (bounded by its force
 * timer) before it stops the dispatcher, the job queue and the pool.
 *
 * @example
 * const inFlightWork = createInFlightWork();
 * await inFlightWork.run(() => handler(req, res));   // counted while it runs
 * await inFlightWork.settled();                       // resolves when nothing is running
 */
export interface InFlightWork {
  /** Run `work`, counting it until its promise settles (resolved or rejected); returns its result. */
  run<T>(work: () => Promise<T> | T): Promise<T>;
  /** Resolves once no work is running (at once when none is). */
  settled(): Promise<void>;
  /** How many pieces of work are running now. */
  count(): number;
}

export function createInFlightWork(): InFlightWork {
  let running = 0;
  let waiters: (() => void)[] = [];

  const finish = () => {
    running -= 1;
    if (running === 0) {
      const ready = waiters;
      waiters = [];
      for (const resolve of ready) resolve();
    }
  };

  return {
    async run(work) {
      running += 1;
      try {
        return await work();
      } finally {
        finish();
      }
    },
    settled() {
      if (running === 0) return Promise.resolve();
      return new Promise<void>((resolve) => waiters.push(resolve));
    },
    count: () => running,
  };
}
