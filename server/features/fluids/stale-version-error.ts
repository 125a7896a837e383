import { ConflictError } from '../../errors';

/**
 * A save based on an old version. The route answers 409 with the usual error body plus
 * `current`, the record as it is now, so the page can show what changed.
 */
export class StaleVersionError<T> extends ConflictError {
  constructor(
    entity: string,
    public readonly sentVersion: number,
    public readonly current: T,
    currentVersion: number,
  ) {
    super(`Someone saved this ${entity} after you opened it (you had version ${sentVersion}, it is now ${currentVersion}). Review the current values and save again.`, {
      version: `stale: current version is ${currentVersion}`,
    });
  }
}
