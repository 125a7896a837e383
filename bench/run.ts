/**
 * `npm run bench`: runs every bench/*.bench.ts file in turn (each a standalone script
 * that prints its own medians against its target) and fails when any script fails.
 * Pass names to run a subset: `npm run bench -- solver`.
 */
import { readdirSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const benchDir = dirname(fileURLToPath(import.meta.url));
const wanted = process.argv.slice(2);
const files = readdirSync(benchDir)
  .filter((name) => name.endsWith('.bench.ts'))
  .filter((name) => wanted.length === 0 || wanted.some((w) => name.includes(w)))
  .sort();

let failures = 0;
for (const file of files) {
  console.log(`\n== ${file} ==`);
  const run = spawnSync(process.execPath, ['--import', 'tsx', join(benchDir, file)], { stdio: 'inherit' });
  if (run.status !== 0) failures += 1;
}
if (files.length === 0) console.log('no benchmarks matched');
process.exit(failures === 0 ? 0 : 1);
