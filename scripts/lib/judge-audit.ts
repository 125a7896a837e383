import { z } from 'zod';

/** One explained advisory: which package, which advisory (npm's numeric source id or its URL), and why it does not apply. */
export const auditExceptionsSchema = z.array(
  z.object({ advisory: z.string().min(1), package: z.string().min(1), reason: z.string().min(10, 'reason must say why (10 characters or more)') }),
);
export type AuditExceptions = z.infer<typeof auditExceptionsSchema>;

/** An advisory as `npm audit --json` lists it under a package's `via`. */
export interface AuditAdvisory {
  source?: number;
  name?: string;
  title?: string;
  url?: string;
  severity?: string;
}
/** The `vulnerabilities` object of `npm audit --json` (npm 7 and later): package name → finding. */
export type AuditVulnerabilities = Record<string, { name: string; severity: string; via: Array<AuditAdvisory | string> }>;

/**
 * Sorts the high and critical advisories of an audit report into explained and unexplained ones.
 * A `via` entry that is a string only says the finding comes through another package, which is
 * listed (and judged) under its own name, so it is not counted twice.
 *
 * @param vulnerabilities - the report's `vulnerabilities`
 * @param exceptions - the explained advisories (audit-exceptions.json)
 * @returns the count of high/critical advisories and one printable line for each, explained or not
 */
export function judgeAudit(vulnerabilities: AuditVulnerabilities, exceptions: AuditExceptions) {
  const explained: string[] = [];
  const unexplained: string[] = [];
  let serious = 0;
  for (const vulnerability of Object.values(vulnerabilities)) {
    for (const via of vulnerability.via) {
      if (typeof via === 'string') continue;
      const severity = via.severity ?? vulnerability.severity;
      if (severity !== 'high' && severity !== 'critical') continue;
      serious += 1;
      const line = `${severity.padEnd(8)} ${vulnerability.name}: ${via.title ?? 'advisory'} ${via.url ?? ''}`.trimEnd();
      const isExplained = exceptions.some(
        (e) => e.package === vulnerability.name && (e.advisory === String(via.source) || (via.url !== undefined && e.advisory === via.url)),
      );
      (isExplained ? explained : unexplained).push(line);
    }
  }
  return { serious, explained, unexplained };
}
