#!/usr/bin/env node
/**
 * Entry point behind `npm start`, `npm test` and `npm run dev`.
 *
 * Plain Node with no dependencies, because it runs before node_modules exists:
 * 1. installs the locked dependencies when node_modules is missing or older than package-lock.json;
 * 2. runs `node --import tsx scripts/<command>.ts`, passing arguments, Ctrl-C / SIGTERM and the exit code through.
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const projectRoot = join(dirname(fileURLToPath(import.meta.url)), '..');
const knownCommands = ['start', 'test', 'dev'];
const [command, ...passThroughArgs] = process.argv.slice(2);

if (!knownCommands.includes(command)) {
  console.error(`bootstrap: unknown command "${command ?? ''}"; expected one of ${knownCommands.join(', ')}`);
  process.exit(2);
}

function dependenciesAreStale() {
  const installedMarker = join(projectRoot, 'node_modules', '.package-lock.json');
  const lockfile = join(projectRoot, 'package-lock.json');
  if (!existsSync(join(projectRoot, 'node_modules')) || !existsSync(installedMarker)) return true;
  if (!existsSync(lockfile)) return false;
  return statSync(lockfile).mtimeMs > statSync(installedMarker).mtimeMs;
}

function installDependencies() {
  const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
  const hasLockfile = existsSync(join(projectRoot, 'package-lock.json'));
  const args = hasLockfile ? ['ci', '--no-audit', '--no-fund'] : ['install', '--no-audit', '--no-fund'];
  console.log(`bootstrap: installing dependencies (npm ${args.join(' ')}) …`);
  const result = spawnSync(npm, args, { cwd: projectRoot, stdio: 'inherit' });
  if (result.status !== 0) {
    console.error(`bootstrap: npm ${args[0]} failed (exit ${result.status ?? result.signal}); fix the error above and run again`);
    process.exit(result.status ?? 1);
  }
}

if (dependenciesAreStale()) installDependencies();

const child = spawn(process.execPath, ['--import', 'tsx', join(projectRoot, 'scripts', `${command}.ts`), ...passThroughArgs], {
  cwd: projectRoot,
  stdio: 'inherit',
  env: process.env,
});

// Forward stop signals; the child decides how to shut down and we exit with its code.
for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) {
  process.on(signal, () => {
    if (child.exitCode === null && child.signalCode === null) child.kill(signal);
  });
}

child.on('exit', (code, signal) => {
  if (signal) {
    // Re-raise so our parent sees the same cause of death (e.g. 130 for SIGINT in a shell).
    process.removeAllListeners(signal);
    process.kill(process.pid, signal);
    return;
  }
  process.exit(code ?? 1);
});
child.on('error', (error) => {
  console.error(`bootstrap: could not start scripts/${command}.ts: ${error.message}`);
  process.exit(1);
});
