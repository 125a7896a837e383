import { UnprocessableError } from '../../errors';

/**
 * Runs a physics-core call and turns a RangeError (an input the physics cannot accept) into a 422
 * naming the field. The core's messages start with the parameter name ("wetThickness must be …",
 * "zones[1].length must be …"); that name, as a dotted path under `prefix`, becomes the field key.
 */
export function withPhysicsFieldErrors<T>(run: () => T, prefix = ''): T {
  try {
    return run();
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    throw new UnprocessableError(`Some values are not right: ${error.message}`, { [fieldOf(error.message, prefix)]: error.message });
  }
}

/** {@link withPhysicsFieldErrors} for an async call. */
export async function withPhysicsFieldErrorsAsync<T>(run: () => Promise<T>, prefix = ''): Promise<T> {
  try {
    return await run();
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    throw new UnprocessableError(`Some values are not right: ${error.message}`, { [fieldOf(error.message, prefix)]: error.message });
  }
}

/** The dotted field path a physics message starts with, or '_' when it names none. */
export function fieldOf(message: string, prefix = ''): string {
  const match = /^([A-Za-z_][\w]*(?:\[\d+\]|\.[A-Za-z_]\w*)*)\s(?:must|is|has|needs)\b/.exec(message);
  if (!match) return '_';
  const path = match[1].replace(/\[(\d+)\]/g, '.$1');
  return prefix ? `${prefix}.${path}` : path;
}
