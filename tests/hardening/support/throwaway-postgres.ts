/**
 * A PostgreSQL cluster of a test's own, in a temporary folder on a free port, so a fault test can stop
 * and restart it without touching the shared development server. Debian's binaries run as the
 * `postgres` system user when the tests run as root (initdb refuses root), as scripts/lib/postgres.ts does.
 */
import { spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, chmodSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export interface ThrowawayPostgres {
  port: number;
  adminUrl: string;
  stop(): void;
  start(): void;
  destroy(): void;
}

function binDir(): string {
  const base = '/usr/lib/postgresql';
  const version = readdirSync(base)
    .filter((name) => existsSync(join(base, name, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a))[0];
  if (!version) throw new Error('no PostgreSQL binaries under /usr/lib/postgresql');
  return join(base, version, 'bin');
}

function run(command: string, args: string[]): void {
  const asRoot = process.getuid?.() === 0;
  const [file, full] = asRoot ? ['runuser', ['-u', 'postgres', '--', command, ...args]] : [command, args];
  const result = spawnSync(file, full, { cwd: '/tmp', encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`${command} ${args.join(' ')} failed (${result.status}): ${result.stdout}${result.stderr}`);
}

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

export async function startThrowawayPostgres(): Promise<ThrowawayPostgres> {
  const bin = binDir();
  const root = mkdtempSync(join(tmpdir(), 'quietlayer-fault-pg-'));
  chmodSync(root, 0o755);
  const dataDir = join(root, 'data');
  if (process.getuid?.() === 0) {
    const line = readFileSync('/etc/passwd', 'utf8').split('\n').find((entry) => entry.startsWith('postgres:'));
    if (!line) throw new Error('no postgres system user');
    const [, , uid, gid] = line.split(':');
    chownSync(root, Number(uid), Number(gid));
  }
  run(join(bin, 'initdb'), ['-D', dataDir, '-E', 'UTF8', '--locale=C.UTF-8', '--auth=trust', '-U', 'postgres', '--no-sync']);
  const port = await freePort();
  const start = () =>
    run(join(bin, 'pg_ctl'), [
      '-D', dataDir, '-l', join(root, 'server.log'),
      '-o', `-c listen_addresses=127.0.0.1 -c port=${port} -c unix_socket_directories='' -c fsync=off`,
      '-w', '-t', '60', 'start',
    ]);
  const stop = () => run(join(bin, 'pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', '-t', '60', 'stop']);
  start();
  let destroyed = false;
  return {
    port,
    adminUrl: `postgres://postgres@127.0.0.1:${port}/postgres`,
    start,
    stop,
    destroy() {
      if (destroyed) return;
      destroyed = true;
      try {
        stop();
      } catch {
        // already stopped
      }
      rmSync(root, { recursive: true, force: true });
    },
  };
}

/** Every process of the cluster (postmaster and its children), for freezing it with SIGSTOP. */
export function clusterPids(port: number): number[] {
  const result = spawnSync('pgrep', ['-f', `port=${port}`], { encoding: 'utf8' });
  const roots = result.stdout.split('\n').filter(Boolean).map(Number);
  const all = new Set<number>(roots);
  for (const pid of roots) {
    const children = spawnSync('pgrep', ['-P', String(pid)], { encoding: 'utf8' });
    for (const child of children.stdout.split('\n').filter(Boolean)) all.add(Number(child));
  }
  return [...all];
}
