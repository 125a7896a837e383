/**
 * Ordered clean-up on Ctrl-C / SIGTERM for the long-running scripts. Clean-ups run newest first
 * (server, then mail fake, then the database it used, then PostgreSQL if we started it).
 * A repeated signal while shutting down is ignored (Ctrl-C reaches both npm's wrapper and us);
 * a shutdown that hangs is cut off after a deadline.
 */
type Cleanup = () => Promise<void> | void;

const cleanups: { name: string; run: Cleanup }[] = [];
let installed = false;
let shuttingDown = false;
const SHUTDOWN_DEADLINE_MS = 20_000;

export function onShutdown(name: string, run: Cleanup): void {
  cleanups.push({ name, run });
  if (!installed) {
    installed = true;
    for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
      process.on(signal, () => {
        void shutdown(signal === 'SIGINT' ? 130 : signal === 'SIGTERM' ? 143 : 129);
      });
    }
  }
}

/** Runs every clean-up once (newest first), then exits with `exitCode`. */
export async function shutdown(exitCode: number): Promise<never> {
  if (shuttingDown) return new Promise<never>(() => {});
  shuttingDown = true;
  const deadline = setTimeout(() => {
    console.error(`Shutdown took longer than ${SHUTDOWN_DEADLINE_MS / 1000} s; exiting anyway.`);
    process.exit(exitCode || 1);
  }, SHUTDOWN_DEADLINE_MS);
  deadline.unref();
  for (const cleanup of cleanups.reverse()) {
    try {
      await cleanup.run();
    } catch (error) {
      console.error(`Shutdown: ${cleanup.name} failed:`, error);
    }
  }
  process.exit(exitCode);
}
