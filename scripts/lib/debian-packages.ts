import { spawnSync } from 'node:child_process';
import { SetupError } from './setup-error';

/** True when this process runs as root (initdb, apt-get and file ownership depend on it). */
export function isRoot(): boolean {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

function canUseSudoWithoutPrompt(): boolean {
  const probe = spawnSync('sudo', ['-n', 'true'], { stdio: 'ignore' });
  return probe.status === 0;
}

function run(command: string, args: string[]): void {
  const result = spawnSync(command, args, {
    stdio: 'inherit',
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
  if (result.status !== 0) {
    throw new SetupError(`"${[command, ...args].join(' ')}" failed (exit ${result.status ?? result.signal}).`);
  }
}

/**
 * Installs Debian packages with apt-get: directly as root, through `sudo -n` as an ordinary
 * user with sudo rights; otherwise stops and prints the exact command to run once by hand.
 */
export function installDebianPackages(packages: string[], why: string): void {
  const aptArgs = ['install', '-y', '--no-install-recommends', ...packages];
  const manualCommand = `sudo apt-get update && sudo apt-get install -y --no-install-recommends ${packages.join(' ')}`;
  const announce = () => console.log(`Installing ${packages.join(', ')} with apt-get (${why}) …`);
  if (isRoot()) {
    announce();
    run('apt-get', ['update']);
    run('apt-get', aptArgs);
    return;
  }
  if (canUseSudoWithoutPrompt()) {
    announce();
    run('sudo', ['-n', 'apt-get', 'update']);
    run('sudo', ['-n', 'apt-get', ...aptArgs]);
    return;
  }
  throw new SetupError(
    `${packages.join(', ')} ${packages.length === 1 ? 'is' : 'are'} needed (${why}) but this user cannot install packages ` +
      `without a password. Run this once, then try again:\n\n  ${manualCommand}\n`,
  );
}
