/**
 * `npm test`: every test in the project against a real PostgreSQL and Debian's Chromium.
 * Makes PostgreSQL available, installs chromium and poppler-utils with apt-get when missing,
 * builds the client (end-to-end tests serve dist/client), runs `vitest run` (extra arguments are
 * passed on, e.g. `npm test -- server/mail`) and ends with exactly one line `N passed, N failed`.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { buildClientIfStale } from './lib/build-client';
import { installDebianPackages } from './lib/debian-packages';
import { ensurePostgres, type PostgresHandle } from './lib/postgres';
import { projectRoot } from './lib/project-root';
import { SetupError } from './lib/setup-error';

const outputDir = join(projectRoot, 'test-output');
const jsonReport = join(outputDir, 'vitest.json');

/** Browser and PDF rasteriser the end-to-end tests drive. */
const requiredTools = [
  { path: '/usr/bin/chromium', debianPackage: 'chromium' },
  { path: '/usr/bin/pdftoppm', debianPackage: 'poppler-utils' },
];

interface VitestJsonReport {
  numPassedTests: number;
  numFailedTests: number;
  testResults: { name: string; status: string; message?: string; assertionResults: { status: string }[] }[];
}

/**
 * Counts from vitest's JSON report. A test file that failed before any of its tests could run
 * (an import or set-up error) counts as one failed test, so it can never hide.
 */
function countResults(report: VitestJsonReport): { passed: number; failed: number } {
  const brokenFiles = report.testResults.filter(
    (file) => file.status === 'failed' && !file.assertionResults.some((test) => test.status === 'failed'),
  ).length;
  return { passed: report.numPassedTests, failed: report.numFailedTests + brokenFiles };
}

let postgres: PostgresHandle | undefined;
let vitest: ChildProcess | undefined;

async function stopAndExit(code: number, countLine: string): Promise<never> {
  await postgres?.stop();
  console.log(countLine);
  process.exit(code);
}

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    if (vitest && vitest.exitCode === null) vitest.kill(signal);
    else void stopAndExit(1, '0 passed, 0 failed');
  });
}

async function main(): Promise<never> {
  postgres = await ensurePostgres();

  const missing = requiredTools.filter((tool) => !existsSync(tool.path));
  if (missing.length > 0) {
    installDebianPackages(
      missing.map((tool) => tool.debianPackage),
      'the end-to-end tests drive Chromium and rasterise PDFs',
    );
  }

  try {
    await buildClientIfStale();
  } catch (error) {
    console.error((error as Error).message);
    return stopAndExit(1, '0 passed, 1 failed');
  }

  mkdirSync(outputDir, { recursive: true });
  rmSync(jsonReport, { force: true });
  vitest = spawn(
    process.execPath,
    [
      join(projectRoot, 'node_modules', 'vitest', 'vitest.mjs'),
      'run',
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${jsonReport}`,
      ...process.argv.slice(2),
    ],
    { cwd: projectRoot, stdio: 'inherit' },
  );
  const vitestExit = await new Promise<number>((resolve) => vitest!.on('exit', (code) => resolve(code ?? 1)));

  if (!existsSync(jsonReport)) {
    console.error(`vitest exited with ${vitestExit} and wrote no report (${jsonReport}).`);
    return stopAndExit(1, '0 passed, 0 failed');
  }
  const { passed, failed } = countResults(JSON.parse(readFileSync(jsonReport, 'utf8')) as VitestJsonReport);
  if (passed + failed === 0) console.error('No test ran.');
  else if (failed === 0 && vitestExit !== 0) console.error(`vitest exited with ${vitestExit} (an error outside the tests; see above).`);
  const ok = failed === 0 && passed > 0 && vitestExit === 0;
  return stopAndExit(ok ? 0 : 1, `${passed} passed, ${failed} failed`);
}

main().catch((error: unknown) => {
  console.error(error instanceof SetupError ? `\n${error.message}` : error);
  void stopAndExit(1, '0 passed, 0 failed');
});
