import { shutdown } from './shutdown';

/**
 * A set-up step that cannot continue for a reason the person at the keyboard can fix
 * (missing rights, a busy port, …). Scripts print only the message, no stack trace.
 */
export class SetupError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SetupError';
  }
}

/** Errors whose message is written for people (ours, and server/env.ts's EnvError). */
function isForPeople(error: unknown): error is Error {
  return error instanceof Error && (error.name === 'SetupError' || error.name === 'EnvError');
}

/**
 * Runs a script's main function. On failure prints the error (plainly when it is meant for
 * people), runs the clean-ups registered so far (e.g. stops the PostgreSQL it started) and exits 1.
 */
export function runMain(main: () => Promise<void>): void {
  main().catch((error: unknown) => {
    console.error(isForPeople(error) ? `\n${error.message}` : error);
    void shutdown(1);
  });
}
