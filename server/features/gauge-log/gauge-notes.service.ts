import type { z } from 'zod';
import {
  noteMeaningLabels,
  type GaugeNote,
  type closeNoteInputSchema,
  type dispositionInputSchema,
  type gaugeNoteListQuerySchema,
} from '../../../shared/schemas/gauge-log';
import type { CurrentUser } from '../../auth/current-user';
import type { Database } from '../../db/client';
import { ForbiddenError, NotFoundError, UnprocessableError } from '../../errors';
import { recordAuditEvent } from '../audit/record-audit-event';
import { confirmSigner, ownWorkRefusal, signatureManifest, signedContentSha256 } from '../signatures/electronic-signature';
import { findNoteForUpdate, findNotePage, updateNote } from './gauge-log.repository';

type NotePageRow = Awaited<ReturnType<typeof findNotePage>>['rows'][number];

function toNote(row: NotePageRow, user: CurrentUser): GaugeNote {
  const n = row.note;
  const actions: GaugeNote['allowedActions'] = [];
  if (n.state !== 'closed' && user.role === 'engineer' && user.id === n.ownerId) actions.push('disposition');
  if (n.state === 'dispositioned' && user.role === 'reviewer' && user.id !== n.dispositionBy) actions.push('close');
  return {
    id: n.id,
    revisionId: n.revisionId,
    sheetNumber: row.sheetNumber,
    title: row.title,
    line: row.line,
    run: n.run,
    state: n.state,
    ownerId: n.ownerId,
    ownerName: row.ownerName,
    openedAt: n.openedAt.toISOString(),
    overCount: n.overCount,
    worstMargin: n.worstMargin,
    disposition: n.disposition,
    dispositionByName: row.dispositionByName,
    dispositionAt: n.dispositionAt ? n.dispositionAt.toISOString() : null,
    signature:
      n.state === 'closed' && n.closedByName && n.closedByRole && n.closeMeaning && n.closedAt
        ? {
            printedName: n.closedByName,
            role: n.closedByRole,
            meaning: n.closeMeaning as keyof typeof noteMeaningLabels,
            meaningText: noteMeaningLabels[n.closeMeaning as keyof typeof noteMeaningLabels],
            signedAt: n.closedAt.toISOString(),
          }
        : null,
    allowedActions: actions,
  };
}

export async function listNotes(db: Database, user: CurrentUser, query: z.output<typeof gaugeNoteListQuerySchema>) {
  const { rows, total } = await findNotePage(db, query);
  return { items: rows.map((r) => toNote(r, user)), total, page: query.page, pageSize: query.pageSize };
}

export async function getNote(db: Database, user: CurrentUser, id: string): Promise<GaugeNote> {
  const { rows } = await findNotePage(db, { page: 1, pageSize: 1, ids: [id] });
  if (rows.length === 0) throw new NotFoundError('No nonconformance note has this id.');
  return toNote(rows[0], user);
}

/** The owner (process engineer) writes or revises the disposition of an open note. */
export async function dispositionNote(db: Database, user: CurrentUser, id: string, input: z.output<typeof dispositionInputSchema>, requestId: string): Promise<GaugeNote> {
  await db.transaction(async (tx) => {
    const note = await findNoteForUpdate(tx, id);
    if (!note) throw new NotFoundError('No nonconformance note has this id.');
    if (note.ownerId !== user.id) throw new ForbiddenError('Only the owner of the released check writes the disposition of its notes.');
    if (note.state === 'closed') throw new UnprocessableError('This note is closed and signed; it cannot change.');
    const at = new Date();
    await updateNote(tx, id, { disposition: input.disposition, dispositionBy: user.id, dispositionAt: at, state: 'dispositioned' });
    await recordAuditEvent(tx, {
      actor: { id: user.id, email: user.email },
      action: 'gauge_note.dispositioned',
      entityType: 'gauge_note',
      entityId: id,
      before: { state: note.state, disposition: note.disposition },
      after: { state: 'dispositioned', disposition: input.disposition },
      requestId,
    });
  });
  return getNote(db, user, id);
}

/**
 * A QA reviewer closes a dispositioned note with an electronic signature, under the rules of
 * server/features/signatures/electronic-signature.ts (password re-entered, failures audited, alerted
 * and paused, not the author of the disposition, printed name, role, meaning and time). The SHA-256
 * of what was signed (the note, its disposition and the signature) goes into the trail.
 */
export async function closeNote(
  db: Database,
  user: CurrentUser,
  id: string,
  input: z.output<typeof closeNoteInputSchema>,
  meta: { requestId: string; publicUrl: string },
): Promise<GaugeNote> {
  await confirmSigner(db, user, input.password, {
    entityType: 'gauge_note',
    entityId: id,
    noun: 'note',
    alertKind: 'gauge-note-sign-failures-alert',
    describe: async () => {
      const { rows } = await findNotePage(db, { page: 1, pageSize: 1, ids: [id] });
      const row = rows[0];
      if (!row) return { kind: 'nonconformance note', heading: [`Nonconformance note ${id}`], link: `${meta.publicUrl}/gauge` };
      return {
        kind: 'nonconformance note',
        heading: [`Nonconformance note on ${row.sheetNumber} (${row.title}), run ${row.note.run}`, `Line: ${row.line}`],
        link: `${meta.publicUrl}/gauge/${row.note.revisionId}`,
      };
    },
    requestId: meta.requestId,
  });
  await db.transaction(async (tx) => {
    const note = await findNoteForUpdate(tx, id);
    if (!note) throw new NotFoundError('No nonconformance note has this id.');
    if (note.state === 'closed') throw new UnprocessableError('This note is already closed and signed.');
    if (note.state !== 'dispositioned') throw new UnprocessableError('The owner must write a disposition before the note can be closed.');
    const ownWork = ownWorkRefusal(user.id, note.dispositionBy, 'the disposition', 'close this note');
    if (ownWork) throw new ForbiddenError(ownWork);
    const { printedName, role, meaning, signedAt } = signatureManifest(user, input.meaning, noteMeaningLabels);
    const signed = { noteId: id, run: note.run, disposition: note.disposition, printedName, role, meaning, signedAt: signedAt.toISOString() };
    await updateNote(tx, id, { state: 'closed', closedBy: user.id, closedByName: printedName, closedByRole: role, closeMeaning: meaning, closedAt: signedAt });
    await recordAuditEvent(tx, {
      actor: { id: user.id, email: user.email },
      action: 'gauge_note.closed',
      entityType: 'gauge_note',
      entityId: id,
      before: { state: note.state },
      after: { state: 'closed', printedName, role, meaning, signedAt: signed.signedAt, contentSha256: signedContentSha256(JSON.stringify(signed)) },
      requestId: meta.requestId,
    });
  });
  return getNote(db, user, id);
}
