import type { Role } from '../../../shared/schemas/roles';
import { sheetStateLabels, type SheetAction, type SheetState } from '../../../shared/schemas/sheets';
import { ConflictError, ForbiddenError } from '../../errors';
import { ownWorkRefusal } from '../signatures/electronic-signature';

/**
 * THE state machine of a Process sheet revision. Every change of state goes through
 * {@link transition}; nothing else in the code base moves a sheet from one state to another.
 *
 *   Draft ──submit (author, engineer)──▶ Awaiting review
 *   Awaiting review ──sign (QA reviewer, not the author)──▶ Signed
 *   Awaiting review ──return (QA reviewer, with comments)──▶ Returned
 *   Returned | Signed ──revise (engineer; latest revision only)──▶ a new revision, Draft
 *   Signed ──supersede (system, when a later revision of the same sheet is signed)──▶ Superseded
 *
 * Illegal transitions answer 409 (the sheet is in the wrong state); a person whose role or
 * relation to the sheet does not allow the step gets 403. 21 CFR 11.10(f) asks for such
 * "operational system checks to enforce permitted sequencing of steps".
 */
export type SheetEvent = SheetAction | 'supersede';

interface TransitionRule {
  from: readonly SheetState[];
  /** State of this revision afterwards (revise leaves it and makes a new Draft revision). */
  to: SheetState;
  /** Who may trigger it; 'system' = only the server itself, as a consequence of another step. */
  roles: readonly Role[] | 'system';
}

export const sheetTransitions: Readonly<Record<SheetEvent, TransitionRule>> = Object.freeze({
  submit: { from: ['draft'], to: 'awaiting-review', roles: ['engineer'] },
  return: { from: ['awaiting-review'], to: 'returned', roles: ['reviewer'] },
  sign: { from: ['awaiting-review'], to: 'signed', roles: ['reviewer'] },
  revise: { from: ['returned', 'signed'], to: 'draft', roles: ['engineer'] },
  supersede: { from: ['signed'], to: 'superseded', roles: 'system' },
});

export interface WorkflowActor {
  id: string;
  role: Role;
}

export interface WorkflowRevision {
  state: SheetState;
  authorId: string;
  /** Whether this is the newest revision of its sheet. */
  isLatest: boolean;
}

const verbs: Record<SheetEvent, string> = {
  submit: 'submitted for review',
  return: 'returned',
  sign: 'signed',
  revise: 'revised',
  supersede: 'superseded',
};

/** Why `actor` may not perform `event` on `revision`, or null when they may (roles and people only). */
function refusal(event: SheetEvent, actor: WorkflowActor | 'system', revision: WorkflowRevision): string | null {
  const rule = sheetTransitions[event];
  if (rule.roles === 'system') return actor === 'system' ? null : 'This step happens by itself when a later revision is signed.';
  if (actor === 'system') return null;
  if (!rule.roles.includes(actor.role)) return `Your role cannot ${event} a process sheet.`;
  if (event === 'submit' && actor.id !== revision.authorId) return 'Only the author of this revision can submit it for review.';
  if (event === 'sign' || event === 'return') return ownWorkRefusal(actor.id, revision.authorId, 'this revision', 'review and sign it');
  return null;
}

/** Why the revision's state does not allow `event`, or null. */
function stateConflict(event: SheetEvent, revision: WorkflowRevision): string | null {
  const rule = sheetTransitions[event];
  if (!rule.from.includes(revision.state)) {
    const allowed = rule.from.map((s) => sheetStateLabels[s]).join(' or ');
    return `This revision is ${sheetStateLabels[revision.state]}; only a ${allowed} revision can be ${verbs[event]}.`;
  }
  if (event === 'revise' && !revision.isLatest) return 'A newer revision of this sheet exists; revise the newest one.';
  return null;
}

/**
 * Checks one step and returns the state the revision moves to. Throws ForbiddenError (403) when the
 * actor may not take the step, ConflictError (409) when the revision's state does not allow it.
 */
export function transition(event: SheetEvent, actor: WorkflowActor | 'system', revision: WorkflowRevision): SheetState {
  const forbidden = refusal(event, actor, revision);
  if (forbidden) throw new ForbiddenError(forbidden);
  const conflict = stateConflict(event, revision);
  if (conflict) throw new ConflictError(conflict);
  return sheetTransitions[event].to;
}

/** The steps open to `actor` on this revision now (for the page's buttons; the server checks again). */
export function allowedActions(actor: WorkflowActor, revision: WorkflowRevision): SheetAction[] {
  return (['submit', 'return', 'sign', 'revise'] as const).filter(
    (event) => refusal(event, actor, revision) === null && stateConflict(event, revision) === null,
  );
}
