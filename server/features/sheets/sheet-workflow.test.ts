import { describe, expect, it } from 'vitest';
import { roleValues } from '../../../shared/schemas/roles';
import { sheetStateValues, type SheetState } from '../../../shared/schemas/sheets';
import { ConflictError, ForbiddenError } from '../../errors';
import { allowedActions, transition, type SheetEvent } from './sheet-workflow';

const author = { id: 'author', role: 'engineer' as const };
const reviewer = { id: 'reviewer', role: 'reviewer' as const };
const otherEngineer = { id: 'other', role: 'engineer' as const };

/** The workflow of issue 5, written out by hand: event → the one state it may start from → the state after. */
const expected: Record<Exclude<SheetEvent, 'revise'>, [SheetState, SheetState]> = {
  submit: ['draft', 'awaiting-review'],
  sign: ['awaiting-review', 'signed'],
  return: ['awaiting-review', 'returned'],
  supersede: ['signed', 'superseded'],
};

const actorFor = { submit: author, sign: reviewer, return: reviewer, supersede: 'system' as const };

describe('sheet workflow state machine', () => {
  for (const [event, [from, to]] of Object.entries(expected) as [keyof typeof expected, [SheetState, SheetState]][]) {
    for (const state of sheetStateValues) {
      it(`${event} from ${state}: ${state === from ? `moves to ${to}` : 'is refused with 409'}`, () => {
        const run = () => transition(event, actorFor[event], { state, authorId: author.id, isLatest: true });
        if (state === from) expect(run()).toBe(to);
        else expect(run).toThrow(ConflictError);
      });
    }
  }

  it('revise starts a new Draft only from a Returned or Signed latest revision', () => {
    for (const state of sheetStateValues) {
      const run = () => transition('revise', otherEngineer, { state, authorId: author.id, isLatest: true });
      if (state === 'returned' || state === 'signed') expect(run()).toBe('draft');
      else expect(run).toThrow(ConflictError);
    }
    expect(() => transition('revise', author, { state: 'signed', authorId: author.id, isLatest: false })).toThrow(ConflictError);
  });

  it('refuses (403) every role not named for a step, the author as signer or returner, and another engineer as submitter', () => {
    for (const role of roleValues.filter((r) => r !== 'reviewer')) {
      expect(() => transition('sign', { id: 'x', role }, { state: 'awaiting-review', authorId: author.id, isLatest: true })).toThrow(ForbiddenError);
      expect(() => transition('return', { id: 'x', role }, { state: 'awaiting-review', authorId: author.id, isLatest: true })).toThrow(ForbiddenError);
    }
    for (const role of roleValues.filter((r) => r !== 'engineer')) {
      expect(() => transition('submit', { id: author.id, role }, { state: 'draft', authorId: author.id, isLatest: true })).toThrow(ForbiddenError);
    }
    const authorNowReviewer = { id: author.id, role: 'reviewer' as const };
    expect(() => transition('sign', authorNowReviewer, { state: 'awaiting-review', authorId: author.id, isLatest: true })).toThrow(ForbiddenError);
    expect(() => transition('submit', otherEngineer, { state: 'draft', authorId: author.id, isLatest: true })).toThrow(ForbiddenError);
    expect(() => transition('supersede', reviewer, { state: 'signed', authorId: author.id, isLatest: false })).toThrow(ForbiddenError);
  });

  it('offers each person only the steps they may take now', () => {
    expect(allowedActions(author, { state: 'draft', authorId: author.id, isLatest: true })).toEqual(['submit']);
    expect(allowedActions(reviewer, { state: 'awaiting-review', authorId: author.id, isLatest: true })).toEqual(['return', 'sign']);
    expect(allowedActions(otherEngineer, { state: 'signed', authorId: author.id, isLatest: true })).toEqual(['revise']);
    expect(allowedActions(otherEngineer, { state: 'signed', authorId: author.id, isLatest: false })).toEqual([]);
    expect(allowedActions({ id: 't', role: 'technician' }, { state: 'awaiting-review', authorId: author.id, isLatest: true })).toEqual([]);
  });
});
