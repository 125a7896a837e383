/**
 * The embedded PostgreSQL behind `npm start`, `npm test` and `npm run dev`.
 *
 * Uses Debian's own binaries (installed with apt-get when missing), keeps its cluster in a
 * project-local, git-ignored folder and listens on 127.0.0.1 only. A server that already answers
 * on the port is reused and left running; DATABASE_URL skips all of this.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { chmodSync, chownSync, existsSync, mkdirSync, readdirSync, readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import pg from 'pg';
import { installDebianPackages, isRoot } from './debian-packages';
import { projectRoot } from './project-root';
import { SetupError } from './setup-error';

export interface PostgresHandle {
  /** Connection URL for the maintenance database (`postgres`), or DATABASE_URL when that is set. */
  adminUrl: string;
  /** True when this call started the server; only then does stop() do anything. */
  startedByUs: boolean;
  /** Stops the server if this process started it (fast shutdown); otherwise does nothing. */
  stop(): Promise<void>;
}

export interface EnsurePostgresOptions {
  log?: (message: string) => void;
}

const DEFAULT_PORT = 54329;
const DEFAULT_DATA_DIR = '.data/postgres';
const READY_TIMEOUT_MS = 60_000;

/**
 * Makes a PostgreSQL server available and returns how to reach it.
 * Order: DATABASE_URL (start nothing) → a server already answering on PGPORT (reuse, never stop)
 * → start our own cluster from PGDATA_DIR (initdb on first use).
 */
export async function ensurePostgres(options: EnsurePostgresOptions = {}): Promise<PostgresHandle> {
  const log = options.log ?? ((message: string) => console.log(message));
  const externalUrl = process.env.DATABASE_URL;
  if (externalUrl) {
    return { adminUrl: externalUrl, startedByUs: false, stop: async () => {} };
  }

  const port = parsePort(process.env.PGPORT);
  const adminUrl = `postgres://postgres@127.0.0.1:${port}/postgres`;
  const reused = { adminUrl, startedByUs: false, stop: async () => {} };

  const state = await probeServer(adminUrl);
  if (state !== 'absent') {
    if (state === 'starting') await waitUntilReady(adminUrl);
    log(`PostgreSQL: reusing the server already running on 127.0.0.1:${port}`);
    return reused;
  }

  const binDir = findOrInstallBinaries();
  const dataDir = prepareDataDir(log);
  if (!existsSync(join(dataDir, 'PG_VERSION'))) initCluster(binDir, dataDir, log);

  log(`PostgreSQL: starting on 127.0.0.1:${port} (data in ${dataDir}) …`);
  const started = runAsPostgres(join(binDir, 'pg_ctl'), [
    '-D', dataDir,
    '-l', join(dataDir, 'server.log'),
    '-o', `-c listen_addresses=127.0.0.1 -c port=${port} -c unix_socket_directories=''`,
    '-w', '-t', String(READY_TIMEOUT_MS / 1000),
    'start',
  ]);
  if (started.status !== 0) {
    // Someone else may have started the same server between our probe and pg_ctl.
    if ((await probeServer(adminUrl)) === 'ready') return reused;
    throw new SetupError(
      `PostgreSQL did not start (pg_ctl exit ${started.status}).\n${started.output}\n` +
        `Server log: ${join(dataDir, 'server.log')}\n${tailOfFile(join(dataDir, 'server.log'))}`,
    );
  }
  await waitUntilReady(adminUrl);

  let stopped = false;
  return {
    adminUrl,
    startedByUs: true,
    stop: async () => {
      if (stopped) return;
      stopped = true;
      log('PostgreSQL: stopping the server this command started …');
      const result = runAsPostgres(join(binDir, 'pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', 'stop']);
      if (result.status !== 0) log(`PostgreSQL: pg_ctl stop failed: ${result.output}`);
    },
  };
}

function parsePort(value: string | undefined): number {
  if (value === undefined || value === '') return DEFAULT_PORT;
  const port = Number(value);
  if (!Number.isInteger(port) || port < 1 || port > 65_535) {
    throw new SetupError(`PGPORT must be a whole number between 1 and 65535, got "${value}"`);
  }
  return port;
}

/** 'ready' when a PostgreSQL answers a query, 'absent' when nothing listens; throws when something else is in the way. */
async function probeServer(url: string): Promise<'ready' | 'starting' | 'absent'> {
  const client = new pg.Client({ connectionString: url, connectionTimeoutMillis: 3000 });
  client.on('error', () => {});
  try {
    await client.connect();
    await client.query('select 1');
    return 'ready';
  } catch (error) {
    const code = (error as { code?: string }).code;
    if (code === 'ECONNREFUSED') return 'absent';
    // 57P03: the database system is starting up / shutting down.
    if (code === '57P03') return 'starting';
    const where = new URL(url);
    throw new SetupError(
      `Something answers on ${where.hostname}:${where.port} but QuietLayer cannot use it as PostgreSQL ` +
        `(${(error as Error).message}). Stop it, or choose another port with PGPORT.`,
    );
  } finally {
    await client.end().catch(() => {});
  }
}

async function waitUntilReady(url: string): Promise<void> {
  const deadline = Date.now() + READY_TIMEOUT_MS;
  while (Date.now() < deadline) {
    if ((await probeServer(url)) === 'ready') return;
    await new Promise((resolveWait) => setTimeout(resolveWait, 200));
  }
  throw new SetupError(`PostgreSQL did not accept connections within ${READY_TIMEOUT_MS / 1000} s (${url}).`);
}

/** Highest-versioned Debian PostgreSQL bin folder, e.g. /usr/lib/postgresql/15/bin. */
function findBinaries(): string | undefined {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return undefined;
  const versions = readdirSync(base)
    .filter((name) => existsSync(join(base, name, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length > 0 ? join(base, versions[0], 'bin') : undefined;
}

function findOrInstallBinaries(): string {
  const found = findBinaries();
  if (found) return found;
  installDebianPackages(['postgresql'], 'the embedded database');
  const installed = findBinaries();
  if (!installed) throw new SetupError('apt-get installed postgresql but no /usr/lib/postgresql/*/bin/initdb was found.');
  return installed;
}

interface CommandResult {
  status: number | null;
  output: string;
}

/** initdb and postgres refuse to run as root, so as root they run as the `postgres` system user. */
function runAsPostgres(command: string, args: string[]): CommandResult {
  const [file, fullArgs] = isRoot() ? ['runuser', ['-u', 'postgres', '--', command, ...args]] : [command, args];
  const result = spawnSync(file, fullArgs, { cwd: '/tmp', encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
  if (result.error) return { status: null, output: result.error.message };
  return { status: result.status, output: `${result.stdout}${result.stderr}`.trim() };
}

function initCluster(binDir: string, dataDir: string, log: (message: string) => void): void {
  log(`PostgreSQL: creating a new cluster in ${dataDir} (first run) …`);
  const result = runAsPostgres(join(binDir, 'initdb'), [
    '-D', dataDir, '-E', 'UTF8', '--locale=C.UTF-8', '--auth=trust', '-U', 'postgres',
  ]);
  if (result.status !== 0) throw new SetupError(`initdb failed (exit ${result.status}):\n${result.output}`);
}

function postgresSystemUser(): { uid: number; gid: number } {
  const line = readFileSync('/etc/passwd', 'utf8')
    .split('\n')
    .find((entry) => entry.startsWith('postgres:'));
  if (!line) throw new SetupError('The "postgres" system user does not exist; reinstall the Debian postgresql package.');
  const [, , uid, gid] = line.split(':');
  return { uid: Number(uid), gid: Number(gid) };
}

/** Parent folders this creates stay 0755 (mkdir's `mode` would make them 0700 and unreachable for `postgres`). */
function makeParentsTraversable(dataDir: string): void {
  mkdirSync(dirname(dataDir), { recursive: true, mode: 0o755 });
}

/** Creates the folder for the postgres user and checks that it can really reach and write it. */
function makeDataDirForPostgresUser(dataDir: string): boolean {
  const { uid, gid } = postgresSystemUser();
  makeParentsTraversable(dataDir);
  mkdirSync(dataDir, { recursive: true, mode: 0o700 });
  chownSync(dataDir, uid, gid);
  chmodSync(dataDir, 0o700);
  const probe = spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-r', dataDir, '-a', '-w', dataDir, '-a', '-x', dataDir], {
    cwd: '/tmp',
    stdio: 'ignore',
  });
  return probe.status === 0;
}

/**
 * The cluster folder: PGDATA_DIR (default .data/postgres, relative to the project). As root it must
 * belong to `postgres` with every parent traversable; when it cannot, a folder under /tmp is used.
 */
function prepareDataDir(log: (message: string) => void): string {
  const preferred = resolve(projectRoot, process.env.PGDATA_DIR || DEFAULT_DATA_DIR);
  if (!isRoot()) {
    makeParentsTraversable(preferred);
    mkdirSync(preferred, { recursive: true, mode: 0o700 });
    return preferred;
  }
  if (makeDataDirForPostgresUser(preferred)) return preferred;

  const projectHash = createHash('sha256').update(projectRoot).digest('hex').slice(0, 12);
  const fallback = join('/tmp', `quietlayer-${projectHash}`, 'postgres');
  mkdirSync(dirname(fallback), { recursive: true, mode: 0o755 });
  chmodSync(dirname(fallback), 0o755);
  log(
    `PostgreSQL: the postgres system user cannot reach ${preferred} (a parent folder is not traversable); ` +
      `using ${fallback} instead.`,
  );
  if (!makeDataDirForPostgresUser(fallback)) {
    throw new SetupError(`The postgres system user cannot use ${fallback} either; set PGDATA_DIR to a folder it can reach.`);
  }
  return fallback;
}

function tailOfFile(path: string, lines = 20): string {
  try {
    return readFileSync(path, 'utf8').trimEnd().split('\n').slice(-lines).join('\n');
  } catch {
    return '(no log file)';
  }
}
