import { describe, expect, it } from 'vitest';
import { auditExceptionsSchema, judgeAudit, type AuditVulnerabilities } from '../../scripts/lib/judge-audit';

// Shaped like the `vulnerabilities` object `npm audit --json` prints (npm 7+ report format, from memory);
// package names and advisories here are invented.
const report: AuditVulnerabilities = {
  'left-pad-ish': {
    name: 'left-pad-ish',
    severity: 'high',
    via: [{ source: 1001, name: 'left-pad-ish', title: 'Prototype pollution', url: 'https://example.invalid/advisories/1001', severity: 'high' }],
  },
  'wraps-left-pad': { name: 'wraps-left-pad', severity: 'high', via: ['left-pad-ish'] },
  'slow-regex': {
    name: 'slow-regex',
    severity: 'moderate',
    via: [{ source: 1002, name: 'slow-regex', title: 'ReDoS', url: 'https://example.invalid/advisories/1002', severity: 'moderate' }],
  },
  'big-hole': {
    name: 'big-hole',
    severity: 'critical',
    via: [{ source: 1003, name: 'big-hole', title: 'Remote code execution', url: 'https://example.invalid/advisories/1003', severity: 'critical' }],
  },
};

describe('judgeAudit', () => {
  it('counts high and critical advisories once each, skipping moderate ones and findings only passed through', () => {
    const verdict = judgeAudit(report, []);
    expect(verdict.serious).toBe(2);
    expect(verdict.unexplained).toHaveLength(2);
    expect(verdict.unexplained.join('\n')).toMatch(/left-pad-ish: Prototype pollution/);
    expect(verdict.unexplained.join('\n')).not.toMatch(/slow-regex|wraps-left-pad/);
  });

  it('an explanation by advisory id or URL moves exactly that advisory to the explained list', () => {
    const exceptions = auditExceptionsSchema.parse([
      { advisory: '1001', package: 'left-pad-ish', reason: 'only reachable from the build tool, never shipped' },
    ]);
    const verdict = judgeAudit(report, exceptions);
    expect(verdict.explained).toHaveLength(1);
    expect(verdict.unexplained).toEqual([expect.stringMatching(/big-hole/)]);
    const byUrl = judgeAudit(report, [{ advisory: 'https://example.invalid/advisories/1003', package: 'big-hole', reason: 'the affected function is never called' }]);
    expect(byUrl.unexplained).toEqual([expect.stringMatching(/left-pad-ish/)]);
  });

  it('refuses an exception without a reason', () => {
    expect(() => auditExceptionsSchema.parse([{ advisory: '1', package: 'x', reason: 'ok' }])).toThrow(/reason/);
  });
});
