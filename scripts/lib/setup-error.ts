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

/** Runs a script's main function; prints set-up errors plainly and exits non-zero on any failure. */
export function runMain(main: () => Promise<void>): void {
  main().catch((error: unknown) => {
    if (error instanceof SetupError) console.error(`\n${error.message}`);
    else console.error(error);
    process.exit(1);
  });
}
