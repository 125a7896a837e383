/**
 * Dependency audit (`npm run audit`): the registry's advisory check for the packages the server
 * ships (production dependencies), judged against the explained exceptions in audit-exceptions.json.
 *
 *   exit 0  no high or critical advisory, or each one explained in audit-exceptions.json
 *   exit 1  a high or critical advisory nobody has explained (printed with its package and link)
 *   exit 2  the audit could not run (the registry's advisory endpoint refused or is unreachable)
 *
 * An exception is `{ "advisory": <id or URL>, "package": <name>, "reason": <why it does not apply> }`.
 * Options: --all also audits development dependencies (build and test tools, not shipped).
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { auditExceptionsSchema, judgeAudit, type AuditVulnerabilities } from './lib/judge-audit';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const exceptions = auditExceptionsSchema.parse(JSON.parse(readFileSync(path.join(root, 'audit-exceptions.json'), 'utf8')));

interface AuditReport {
  vulnerabilities?: AuditVulnerabilities;
  error?: { code?: string; summary?: string; detail?: string };
  /** What npm prints instead of a report when the advisory endpoint answers with an HTTP error. */
  message?: string;
}

const args = ['audit', '--json', ...(process.argv.includes('--all') ? [] : ['--omit=dev'])];
const run = spawnSync('npm', args, { cwd: root, encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
let report: AuditReport;
try {
  report = JSON.parse(run.stdout || '{}') as AuditReport;
} catch {
  report = { error: { summary: (run.stderr || run.stdout || 'no output').trim().split('\n').slice(-3).join(' ') } };
}
if (report.error || !report.vulnerabilities) {
  const why = report.message ?? report.error?.summary ?? report.error?.detail ?? (run.stderr || 'no report').trim().split('\n').slice(-2).join(' ');
  console.error(`The dependency audit could not run: ${why}`);
  console.error('The advisory check needs the npm registry\'s audit endpoint; run `npm run audit` where it is reachable.');
  process.exit(2);
}

const verdict = judgeAudit(report.vulnerabilities, exceptions);
for (const line of verdict.explained) console.log(`explained   ${line}`);
for (const line of verdict.unexplained) console.log(`UNEXPLAINED ${line}`);
console.log(`${verdict.serious} high or critical advisories, ${verdict.unexplained.length} without an explanation in audit-exceptions.json.`);
process.exit(verdict.unexplained.length === 0 ? 0 : 1);
