import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Absolute path of the repository root (this file lives in scripts/lib). */
export const projectRoot = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
