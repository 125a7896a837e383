import type { z } from 'zod';
import { roleLabels } from '../../../shared/schemas/roles';
import {
  signatureMeaningLabels,
  type CreateSheetInput,
  type SheetDetail,
  type SheetFilters,
  type SheetSignature,
  type SheetSummary,
  type SignatureMeaning,
  type VerifyResult,
  createSheetInputSchema,
  returnSheetInputSchema,
  reviseSheetInputSchema,
  sheetListQuerySchema,
  signSheetInputSchema,
} from '../../../shared/schemas/sheets';
import type { CurrentUser } from '../../auth/current-user';
import type { Database, DbOrTx } from '../../db/client';
import type { Env } from '../../env';
import { ConflictError, NotFoundError, UnprocessableError } from '../../errors';
import { enqueueMail } from '../../mail/enqueue-mail';
import { recordAuditEvent } from '../audit/record-audit-event';
import { confirmSigner, signatureManifest, signedContentSha256 } from '../signatures/electronic-signature';
import { dryingPathForSheet, propertySpreadForSheet } from './beyond-onset-summaries';
import { buildSheetSnapshot } from './build-sheet-snapshot';
import { renderSheetPdf, type SheetPdfInput } from './pdf/render-sheet-pdf';
import { reviewRequestMail, sheetHeading, sheetReturnedMail, sheetSignedMail, type SheetMailContext } from './sheet-mail';
import { SHEET_SITE, sheetNumber } from './sheet-site';
import { allowedActions, transition } from './sheet-workflow';
import {
  findActiveUsersWithRole,
  findAuditOfRevisions,
  findBySignedSha,
  findCheckRevisionForSheet,
  findFluidForSnapshot,
  findLatestDryingSetup,
  findLatestFinishedSpread,
  findReturns,
  findReturnsOfSheet,
  findRevision,
  findSheetFilters,
  findSheetPage,
  findSignature,
  findSignedPdf,
  findSuccessorSigned,
  insertReturn,
  insertRevision,
  insertSheet,
  insertSignature,
  listRevisionsOfSheet,
  lockEarlierSigned,
  setRevisionState,
  takeSheetNumber,
  type RevisionWithSheet,
  type SignatureRow,
} from './sheets.repository';

export interface RequestMeta {
  requestId?: string;
}

const ENTITY = 'process_sheet';
const actorOf = (user: CurrentUser) => ({ id: user.id, email: user.email });

function sheetLink(env: Pick<Env, 'PUBLIC_URL'>, revisionId: string): string {
  return `${env.PUBLIC_URL}/sheets/${revisionId}`;
}

function mailContext(env: Pick<Env, 'PUBLIC_URL'>, row: RevisionWithSheet): SheetMailContext {
  return { number: row.sheet.number, revision: row.revision.revision, title: row.revision.title, line: row.revision.line, link: sheetLink(env, row.revision.id) };
}

function toSignature(row: SignatureRow): SheetSignature {
  const meaning = row.meaning as SignatureMeaning;
  return {
    signerId: row.signerId,
    printedName: row.printedName,
    role: row.signerRole,
    meaning,
    meaningText: signatureMeaningLabels[meaning] ?? row.meaning,
    signedAt: row.signedAt.toISOString(),
    pdfSha256: row.pdfSha256,
  };
}

function toSummary(row: RevisionWithSheet): SheetSummary {
  const r = row.revision;
  return {
    id: r.id,
    sheetId: r.sheetId,
    number: row.sheet.number,
    revision: r.revision,
    state: r.state,
    title: r.title,
    line: r.line,
    processKind: r.snapshot.check.processKind,
    authorId: r.authorId,
    authorName: row.authorName,
    createdAt: r.createdAt.toISOString(),
    margin: r.snapshot.results.margin,
  };
}

async function requireRevision(db: DbOrTx, id: string, options: { forUpdate?: boolean } = {}): Promise<RevisionWithSheet> {
  const row = await findRevision(db, id, options);
  if (!row) throw new NotFoundError('There is no process sheet with this id.');
  return row;
}

const workflowView = (row: RevisionWithSheet) => ({
  state: row.revision.state,
  authorId: row.revision.authorId,
  isLatest: row.revision.revision === row.latestRevision,
});

function isUniqueViolation(error: unknown): boolean {
  let current: unknown = error;
  for (let i = 0; i < 4 && current && typeof current === 'object'; i += 1) {
    if ((current as { code?: string }).code === '23505') return true;
    current = (current as { cause?: unknown }).cause;
  }
  return false;
}

/** Freezes a snapshot of a check revision (newest when not given); 422 when the check cannot be evaluated. */
async function snapshotOfCheck(db: DbOrTx, checkId: string, checkRevision?: number) {
  const found = await findCheckRevisionForSheet(db, checkId, checkRevision);
  if (!found) throw new UnprocessableError('There is no layer check with this id.', { checkId: 'there is no layer check with this id' });
  if (!found.revision) {
    throw new UnprocessableError(`This layer check has no revision ${checkRevision}.`, { checkRevision: `the check has revisions 1 to ${found.check.latest}` });
  }
  const input = found.revision.input as { fluidId?: string };
  const fluid = input.fluidId ? await findFluidForSnapshot(db, input.fluidId) : undefined;
  if (!fluid) throw new UnprocessableError('The fluid of this layer check no longer exists.', { checkId: 'the fluid of this check is missing' });
  const snapshot = buildSheetSnapshot({
    check: found.check,
    revision: { revision: found.revision.revision, input: found.revision.input, savedAt: found.revision.savedAt, savedByName: found.revision.savedByName },
    fluid,
  });
  // Drying path and Property spread where the check revision has them (optional parts of a sheet).
  const [drying, spread] = await Promise.all([
    findLatestDryingSetup(db, checkId, found.revision.revision),
    findLatestFinishedSpread(db, checkId, found.revision.revision),
  ]);
  const dryingPath = drying ? dryingPathForSheet(drying.title, drying.summary) : undefined;
  const propertySpread = spread ? propertySpreadForSheet(spread.result) : undefined;
  if (dryingPath) snapshot.dryingPath = JSON.parse(JSON.stringify(dryingPath));
  if (propertySpread) snapshot.propertySpread = JSON.parse(JSON.stringify(propertySpread));
  return { snapshot, check: found.check, checkRevision: found.revision.revision };
}

/** One page of sheets (newest revision of each by default), filtered by state, line, author or text. */
export async function listSheets(db: DbOrTx, query: z.output<typeof sheetListQuerySchema>): Promise<{ items: SheetSummary[]; total: number }> {
  const { rows, total } = await findSheetPage(db, query);
  return {
    items: rows.map((r) => ({ ...r, processKind: r.processKind as SheetSummary['processKind'], createdAt: r.createdAt.toISOString(), margin: r.margin === null ? null : Number(r.margin) })),
    total,
  };
}

export function getSheetFilters(db: DbOrTx): Promise<SheetFilters> {
  return findSheetFilters(db);
}

/** A revision with its signature, returns, the sheet's other revisions, its audit entries and what `user` may do. */
export async function getSheet(db: DbOrTx, user: CurrentUser, id: string): Promise<SheetDetail> {
  const row = await requireRevision(db, id);
  const r = row.revision;
  const [signature, returns, revisions] = await Promise.all([findSignature(db, id), findReturns(db, id), listRevisionsOfSheet(db, r.sheetId)]);
  const [audit, successor] = await Promise.all([
    findAuditOfRevisions(db, revisions.map((v) => v.id)),
    r.state === 'superseded' ? findSuccessorSigned(db, r.sheetId, r.revision) : Promise.resolve(undefined),
  ]);
  return {
    ...toSummary(row),
    purpose: r.purpose,
    checkId: row.sheet.checkId,
    checkRevision: r.checkRevision,
    solverVersion: r.solverVersion,
    submittedAt: r.submittedAt?.toISOString() ?? null,
    decidedAt: r.decidedAt?.toISOString() ?? null,
    pdfSha256: r.pdfSha256,
    signature: signature ? toSignature(signature) : null,
    returns: returns.map((x) => ({ reviewerId: x.reviewerId, reviewerName: x.reviewerName, comments: x.comments, returnedAt: x.returnedAt.toISOString() })),
    supersededBy: successor ?? null,
    revisions: revisions.map((v) => ({ ...v, createdAt: v.createdAt.toISOString() })),
    audit: audit.map((a) => ({ ...a, occurredAt: a.occurredAt.toISOString() })),
    snapshot: r.snapshot,
    allowedActions: allowedActions(user, workflowView(row)),
  };
}

/** Issues a new sheet (number from the site's counter, revision 1, Draft) from a layer check revision. */
export async function createSheet(
  db: Database,
  user: CurrentUser,
  input: z.output<typeof createSheetInputSchema>,
  meta: RequestMeta = {},
): Promise<SheetDetail> {
  const { snapshot, check, checkRevision } = await snapshotOfCheck(db, input.checkId, input.checkRevision);
  const id = await db.transaction(async (tx) => {
    const number = sheetNumber(SHEET_SITE.code, await takeSheetNumber(tx, SHEET_SITE.code));
    const sheet = await insertSheet(tx, { number, siteCode: SHEET_SITE.code, checkId: check.id, createdBy: user.id });
    const revision = await insertRevision(tx, {
      sheetId: sheet.id,
      revision: 1,
      state: 'draft',
      title: input.title ?? check.title,
      line: input.line,
      purpose: input.purpose,
      authorId: user.id,
      checkRevision,
      snapshot,
      solverVersion: snapshot.solverVersion,
    });
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: 'sheet.created',
      entityType: ENTITY,
      entityId: revision.id,
      after: { number, revision: 1, state: 'draft', checkId: check.id, checkRevision, line: input.line, solverVersion: snapshot.solverVersion },
      requestId: meta.requestId,
    });
    return revision.id;
  });
  return getSheet(db, user, id);
}

/** A new Draft revision of a Returned or Signed sheet, from the newest revision of its layer check. */
export async function reviseSheet(
  db: Database,
  user: CurrentUser,
  id: string,
  input: z.output<typeof reviseSheetInputSchema>,
  meta: RequestMeta = {},
): Promise<SheetDetail> {
  const current = await requireRevision(db, id);
  transition('revise', user, workflowView(current));
  const { snapshot, checkRevision } = await snapshotOfCheck(db, current.sheet.checkId);
  let newId: string;
  try {
    newId = await db.transaction(async (tx) => {
      const locked = await requireRevision(tx, id, { forUpdate: true });
      transition('revise', user, workflowView(locked));
      const revision = await insertRevision(tx, {
        sheetId: locked.sheet.id,
        revision: locked.revision.revision + 1,
        state: 'draft',
        title: locked.revision.title,
        line: input.line ?? locked.revision.line,
        purpose: input.purpose ?? locked.revision.purpose,
        authorId: user.id,
        checkRevision,
        snapshot,
        solverVersion: snapshot.solverVersion,
      });
      await recordAuditEvent(tx, {
        actor: actorOf(user),
        action: 'sheet.revised',
        entityType: ENTITY,
        entityId: revision.id,
        before: { revisionId: locked.revision.id, revision: locked.revision.revision, state: locked.revision.state, checkRevision: locked.revision.checkRevision },
        after: { number: locked.sheet.number, revision: revision.revision, state: 'draft', checkRevision, solverVersion: snapshot.solverVersion },
        requestId: meta.requestId,
      });
      return revision.id;
    });
  } catch (error) {
    if (isUniqueViolation(error)) throw new ConflictError('Someone else made a new revision of this sheet at the same moment; open the newest one.');
    throw error;
  }
  return getSheet(db, user, newId);
}

/** Draft → Awaiting review; every active QA reviewer is e-mailed (same transaction, via the outbox). */
export async function submitSheet(db: Database, env: Pick<Env, 'PUBLIC_URL'>, user: CurrentUser, id: string, meta: RequestMeta = {}): Promise<SheetDetail> {
  await db.transaction(async (tx) => {
    const row = await requireRevision(tx, id, { forUpdate: true });
    const to = transition('submit', user, workflowView(row));
    await setRevisionState(tx, id, { state: to, submittedAt: new Date() });
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: 'sheet.submitted',
      entityType: ENTITY,
      entityId: id,
      before: { state: row.revision.state },
      after: { state: to },
      requestId: meta.requestId,
    });
    const reviewers = await findActiveUsersWithRole(tx, 'reviewer', { except: row.revision.authorId });
    for (const reviewer of reviewers) await enqueueMail(tx, reviewRequestMail(reviewer.email, mailContext(env, row), row.authorName));
  });
  return getSheet(db, user, id);
}

/** Awaiting review → Returned with comments; the author is e-mailed the comments. */
export async function returnSheet(
  db: Database,
  env: Pick<Env, 'PUBLIC_URL'>,
  user: CurrentUser,
  id: string,
  input: z.output<typeof returnSheetInputSchema>,
  meta: RequestMeta = {},
): Promise<SheetDetail> {
  await db.transaction(async (tx) => {
    const row = await requireRevision(tx, id, { forUpdate: true });
    const to = transition('return', user, workflowView(row));
    const now = new Date();
    await insertReturn(tx, { revisionId: id, reviewerId: user.id, reviewerName: user.displayName, comments: input.comments, returnedAt: now });
    await setRevisionState(tx, id, { state: to, decidedAt: now });
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: 'sheet.returned',
      entityType: ENTITY,
      entityId: id,
      before: { state: row.revision.state },
      after: { state: to },
      reason: input.comments,
      requestId: meta.requestId,
    });
    await enqueueMail(tx, sheetReturnedMail(row.authorEmail, mailContext(env, row), user.displayName, input.comments));
  });
  return getSheet(db, user, id);
}

/** The PDF fields of a revision (everything but the signature). */
function pdfInput(env: Pick<Env, 'PUBLIC_URL'>, row: RevisionWithSheet, returns: Awaited<ReturnType<typeof findReturnsOfSheet>>): Omit<SheetPdfInput, 'signature' | 'state'> {
  return {
    number: row.sheet.number,
    revision: row.revision.revision,
    title: row.revision.title,
    line: row.revision.line,
    purpose: row.revision.purpose,
    authorName: row.authorName,
    createdAt: row.revision.createdAt.toISOString(),
    snapshot: row.revision.snapshot,
    returns: returns.map((r) => ({ revision: r.revision, reviewerName: r.reviewerName, comments: r.comments, returnedAt: r.returnedAt.toISOString() })),
    publicUrl: env.PUBLIC_URL,
  };
}

/**
 * Electronic signature (21 CFR 11.50, 11.200): the reviewer re-enters their password and states the
 * meaning. The PDF is rendered with the filled signature block; its SHA-256, the signer's printed
 * name, id, role, the time (UTC) and the meaning make the signature record; the PDF bytes are stored.
 * An earlier Signed revision of the same sheet becomes Superseded. The author is e-mailed.
 */
export async function signSheet(
  db: Database,
  env: Pick<Env, 'PUBLIC_URL'>,
  user: CurrentUser,
  id: string,
  input: z.output<typeof signSheetInputSchema>,
  meta: RequestMeta = {},
): Promise<SheetDetail> {
  const row = await requireRevision(db, id);
  transition('sign', user, workflowView(row));
  await confirmSigner(db, user, input.password, {
    entityType: ENTITY,
    entityId: id,
    noun: 'sheet',
    alertKind: 'sheet-sign-failures-alert',
    describe: async () => ({ kind: 'process sheet', heading: sheetHeading(mailContext(env, row)), link: sheetLink(env, id) }),
    requestId: meta.requestId,
  });
  await db.transaction(async (tx) => {
    const locked = await requireRevision(tx, id, { forUpdate: true });
    const to = transition('sign', user, workflowView(locked));
    const { printedName, role, meaning, meaningText, signedAt } = signatureManifest(user, input.meaning, signatureMeaningLabels);
    const returns = await findReturnsOfSheet(tx, locked.sheet.id, locked.revision.revision);
    const pdf = await renderSheetPdf({
      ...pdfInput(env, locked, returns),
      state: to,
      signature: { printedName, roleLabel: roleLabels[role], signedAt: signedAt.toISOString(), meaningText },
    });
    const sha256 = signedContentSha256(pdf);
    await setRevisionState(tx, id, { state: to, decidedAt: signedAt, signedPdf: pdf, pdfSha256: sha256 });
    await insertSignature(tx, { revisionId: id, signerId: user.id, printedName, signerRole: role, meaning, signedAt, pdfSha256: sha256 });
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: 'sheet.signed',
      entityType: ENTITY,
      entityId: id,
      before: { state: locked.revision.state },
      after: { state: to, printedName, role, meaning, signedAt: signedAt.toISOString(), pdfSha256: sha256 },
      requestId: meta.requestId,
    });
    for (const earlier of await lockEarlierSigned(tx, locked.sheet.id, locked.revision.revision)) {
      const next = transition('supersede', 'system', { state: 'signed', authorId: '', isLatest: false });
      await setRevisionState(tx, earlier.id, { state: next });
      await recordAuditEvent(tx, {
        actor: actorOf(user),
        action: 'sheet.superseded',
        entityType: ENTITY,
        entityId: earlier.id,
        before: { state: 'signed' },
        after: { state: next, supersededBy: { id, revision: locked.revision.revision } },
        requestId: meta.requestId,
      });
    }
    await enqueueMail(tx, sheetSignedMail(locked.authorEmail, mailContext(env, locked), { name: printedName, meaning: meaningText, signedAt }));
  });
  return getSheet(db, user, id);
}

/** The PDF of a revision: the stored bytes once signed, otherwise drawn from the snapshot now. */
export async function getSheetPdf(db: DbOrTx, env: Pick<Env, 'PUBLIC_URL'>, id: string): Promise<{ bytes: Buffer; filename: string; signed: boolean }> {
  const row = await requireRevision(db, id);
  const filename = `${row.sheet.number}-rev${row.revision.revision}.pdf`;
  if (row.revision.state === 'signed' || row.revision.state === 'superseded') {
    const bytes = await findSignedPdf(db, id);
    if (!bytes) throw new NotFoundError('The signed PDF of this revision is missing.');
    return { bytes, filename, signed: true };
  }
  const returns = await findReturnsOfSheet(db, row.sheet.id, row.revision.revision);
  const bytes = await renderSheetPdf({ ...pdfInput(env, row, returns), state: row.revision.state, signature: null });
  return { bytes, filename, signed: false };
}

/**
 * Which signed revision an uploaded PDF is, by the SHA-256 of its bytes (21 CFR 11.70: the
 * signature is bound to exactly this rendition), or that it matches none. Every check is audited.
 */
export async function verifySheetPdf(db: Database, user: CurrentUser, bytes: Buffer, meta: RequestMeta = {}): Promise<VerifyResult> {
  const sha256 = signedContentSha256(bytes);
  const found = await findBySignedSha(db, sha256);
  const result: VerifyResult = found
    ? {
        match: true,
        sha256,
        sheetId: found.sheet.id,
        revisionId: found.revision.id,
        number: found.sheet.number,
        revision: found.revision.revision,
        title: found.revision.title,
        state: found.revision.state,
        signature: toSignature(found.signature),
      }
    : { match: false, sha256 };
  await recordAuditEvent(db, {
    actor: actorOf(user),
    action: 'sheet.verified',
    entityType: ENTITY,
    entityId: found ? found.revision.id : null,
    after: { sha256, match: result.match, bytes: bytes.length },
    requestId: meta.requestId,
  });
  return result;
}

export type { CreateSheetInput };
