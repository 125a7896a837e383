/**
 * THE access policy: every action any /api route performs, mapped to who may do it.
 *
 * How to add a protected route (fluids, layer checks, process sheets, gauge log, …):
 *   1. Add an action here, named `<feature>.<verb>`, e.g. `'fluids.create': ['engineer', 'administrator']`.
 *      Use PUBLIC for routes anyone may call and SIGNED_IN for "any signed-in role".
 *   2. Register the route with `defineRoute(router, { method, path, action, handler })`
 *      (server/http/define-route.ts). It loads the session and checks this policy before
 *      the handler runs: 401 without a valid session, 403 for a role not listed.
 *   3. Nothing else: tests/integration/route-role-matrix.test.ts walks every registered
 *      route and proves the 401/403 answers, and createApp refuses to start if an /api route
 *      was added to Express without defineRoute.
 *
 * Deny by default: an action that is not in this table is refused for every role.
 */
import type { Role } from '../../shared/schemas/roles';

export const PUBLIC = 'public' as const;
export const SIGNED_IN = 'signed-in' as const;

export type Rule = typeof PUBLIC | typeof SIGNED_IN | readonly Role[];

export const policy = {
  'health.read': PUBLIC,
  'config.read': PUBLIC,
  'auth.sign-in': PUBLIC,
  'auth.sign-out': PUBLIC,
  'auth.password-reset.request': PUBLIC,
  'auth.password-reset.confirm': PUBLIC,
  'invitations.preview': PUBLIC,
  'invitations.accept': PUBLIC,
  'me.read': SIGNED_IN,
  'users.list': ['administrator'],
  'users.invite': ['administrator'],
  'users.update': ['administrator'],
  'audit.list': ['administrator'],
  'outbox.list': ['administrator'],
  // Fluid library and layer checks (issue 4). Process engineers own the process data; administrators
  // run the site and technicians/reviewers read, so only engineers write fluids and checks.
  'fluids.read': SIGNED_IN,
  'fluids.write': ['engineer'],
  'layerChecks.read': SIGNED_IN,
  'layerChecks.write': ['engineer'],
  'layerChecks.evaluate': SIGNED_IN,
  'batch.evaluate': ['engineer'],
  // Beyond onset (issue 7): anyone signed in may evaluate and read; engineers save set-ups, run
  // spreads (they are stored with the check revision) and keep the heats register.
  'dryingPaths.evaluate': SIGNED_IN,
  'dryingPaths.read': SIGNED_IN,
  'dryingPaths.write': ['engineer'],
  'propertySpreads.read': SIGNED_IN,
  'propertySpreads.run': ['engineer'],
  'meltPool.evaluate': SIGNED_IN,
  'meltPool.read': SIGNED_IN,
  'meltPool.write': ['engineer'],
  'heats.read': SIGNED_IN,
  'heats.write': ['engineer'],
  // Process sheets (issue 5): engineers issue and submit, QA reviewers return or sign; everyone reads
  // and may verify a PDF. Who may sign a particular sheet (not its author) is checked in the workflow.
  'sheets.read': SIGNED_IN,
  'sheets.create': ['engineer'],
  'sheets.submit': ['engineer'],
  'sheets.return': ['reviewer'],
  'sheets.sign': ['reviewer'],
  'sheets.verify': SIGNED_IN,
  // Gauge log (issue 6): technicians and engineers upload readings; engineers issue device tokens and
  // disposition nonconformance notes they own; QA reviewers close notes with a signature.
  // 'gauge.device-post' is PUBLIC because POST /api/gauge/readings authenticates by its own bearer
  // token (gauge_tokens, SHA-256, scoped to one sheet and line): it never reads a session cookie.
  'gauge.read': SIGNED_IN,
  'gauge.upload': ['technician', 'engineer'],
  'gauge.tokens': ['engineer'],
  'gauge.device-post': PUBLIC,
  'gauge.notes.disposition': ['engineer'],
  'gauge.notes.close': ['reviewer'],
} as const satisfies Record<string, Rule>;

export type Action = keyof typeof policy;

/** The rule for an action, or undefined when the action is not in the policy (→ denied). */
export function ruleFor(action: string): Rule | undefined {
  return Object.prototype.hasOwnProperty.call(policy, action) ? (policy as Record<string, Rule>)[action] : undefined;
}

export function isPublicAction(action: string): boolean {
  return ruleFor(action) === PUBLIC;
}

/** Whether a signed-in person with `role` may perform `action`. Unknown actions: never. */
export function isAllowed(action: string, role: Role): boolean {
  const rule = ruleFor(action);
  if (rule === undefined) return false;
  if (rule === PUBLIC || rule === SIGNED_IN) return true;
  return rule.includes(role);
}
