import { spawn } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { projectRoot } from './project-root';
import { SetupError } from './setup-error';

/** Everything the client bundle is built from; a newer file here means dist/client is stale. */
const clientInputs = ['index.html', 'vite.config.ts', 'tailwind.config.ts', 'package-lock.json', 'src', 'shared', 'public'];
const builtMarker = join(projectRoot, 'dist', 'client', 'index.html');

function newestModification(path: string): number {
  if (!existsSync(path)) return 0;
  const stats = statSync(path);
  if (!stats.isDirectory()) return stats.mtimeMs;
  let newest = stats.mtimeMs; // a deleted file changes its folder's time
  for (const entry of readdirSync(path)) newest = Math.max(newest, newestModification(join(path, entry)));
  return newest;
}

/** True when dist/client is missing or older than any of its sources. */
export function clientBuildIsStale(): boolean {
  if (!existsSync(builtMarker)) return true;
  const builtAt = statSync(builtMarker).mtimeMs;
  return clientInputs.some((input) => newestModification(join(projectRoot, input)) > builtAt);
}

/**
 * Builds the client into dist/client with Vite (in a child process, so the bundler's memory is
 * returned before the server starts) when it is missing or older than its sources.
 * `track` receives the child so a shutdown can stop it.
 */
export async function buildClientIfStale(options: { track?: (child: import('node:child_process').ChildProcess) => void } = {}): Promise<void> {
  if (!clientBuildIsStale()) {
    console.log('Client: dist/client is up to date');
    return;
  }
  console.log('Client: building with Vite …');
  const child = spawn(process.execPath, [join(projectRoot, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--logLevel', 'warn'], {
    cwd: projectRoot,
    stdio: 'inherit',
  });
  options.track?.(child);
  const code = await new Promise<number | null>((resolve) => child.on('exit', (exitCode) => resolve(exitCode)));
  if (code !== 0) throw new SetupError(`The client build failed (vite build exit ${code}); see the errors above.`);
  console.log('Client: built into dist/client');
}
