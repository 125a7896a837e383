import { createHash } from 'node:crypto';
import type { Role } from '../../../shared/schemas/roles';
import type { CurrentUser } from '../../auth/current-user';
import { verifyPassword } from '../../auth/passwords';
import type { Database } from '../../db/client';
import { TooManyRequestsError, UnprocessableError } from '../../errors';
import { enqueueMail } from '../../mail/enqueue-mail';
import { recordAuditEvent } from '../audit/record-audit-event';
import { countSignFailuresSince, findActiveAdministrators, findPasswordHash } from './signatures.repository';

/**
 * THE rules of an electronic signature in QuietLayer, for every kind of record a QA reviewer signs
 * (process sheets, nonconformance notes of the Gauge log):
 *
 * - the signer enters their password again at each signing (21 CFR 11.200(a)); a wrong password
 *   signs nothing, answers 422 on the `password` field and is recorded in the trail;
 * - failed signings are counted per person across every kind of record: administrators are
 *   e-mailed at every {@link SIGN_FAILURE_ALERT_AT}-th failure in {@link SIGN_FAILURE_WINDOW_MINUTES}
 *   minutes, and from {@link SIGN_FAILURE_LOCKOUT_AT} failures on, signing is paused (429) (11.300(d));
 * - nobody signs their own work: the author of what is signed may not sign it;
 * - the signature shows the printed name, role, meaning and the time (UTC) (11.50), and is bound
 *   to the SHA-256 of exactly what was signed (11.70).
 *
 * Each feature keeps its own record checks, state changes and audit action names; it calls
 * {@link confirmSigner} before it signs and {@link signatureManifest} to write the signature.
 */

/** Failed signings within this window count towards the administrators' alert and the lock-out. */
export const SIGN_FAILURE_WINDOW_MINUTES = 15;
/** Administrators are e-mailed at this many failures in the window (and at each further multiple). */
export const SIGN_FAILURE_ALERT_AT = 3;
/** Further signing attempts are refused (429) once this many failed in the window. */
export const SIGN_FAILURE_LOCKOUT_AT = 6;

/** The audit action of a failed signing, per kind of record; all of them count towards the alert and the lock-out. */
export const signFailureActions = {
  process_sheet: 'sheet.sign_failed',
  gauge_note: 'gauge_note.signing_failed',
} as const;

export type SignedEntity = keyof typeof signFailureActions;

/** What the administrators' alert says about the record the latest failure was on. */
export interface SignedRecordDescription {
  /** e.g. "process sheet" */
  kind: string;
  /** Lines naming the record (number, revision, title, line). */
  heading: string[];
  link: string;
}

export interface SigningAttempt {
  entityType: SignedEntity;
  entityId: string;
  /** The noun of the 422 message: "The password is not right; the <noun> was not signed." */
  noun: string;
  /** Mail kind of the administrators' alert. */
  alertKind: string;
  /** Looked up only when an alert is sent. */
  describe: () => Promise<SignedRecordDescription>;
  requestId?: string;
}

const actorOf = (user: CurrentUser) => ({ id: user.id, email: user.email });
const windowStart = (now: Date) => new Date(now.getTime() - SIGN_FAILURE_WINDOW_MINUTES * 60_000);

/**
 * The signing ceremony's identity check: refuses (429) a person whose signing is paused, then
 * checks the re-entered password. A wrong one is audited (and alerts the administrators at every
 * SIGN_FAILURE_ALERT_AT-th failure) and answers 422; nothing is signed.
 */
export async function confirmSigner(db: Database, user: CurrentUser, password: string, attempt: SigningAttempt): Promise<void> {
  const now = new Date();
  const failedActions = Object.values(signFailureActions);
  const recent = await countSignFailuresSince(db, user.id, failedActions, windowStart(now));
  if (recent >= SIGN_FAILURE_LOCKOUT_AT) {
    throw new TooManyRequestsError(SIGN_FAILURE_WINDOW_MINUTES * 60, `Signing is paused for your account after ${recent} wrong passwords; an administrator has been told. Try again later.`);
  }
  const hash = await findPasswordHash(db, user.id);
  if (hash && (await verifyPassword(password, hash))) return;
  await db.transaction(async (tx) => {
    await recordAuditEvent(tx, {
      actor: actorOf(user),
      action: signFailureActions[attempt.entityType],
      entityType: attempt.entityType,
      entityId: attempt.entityId,
      reason: 'wrong password at signing',
      requestId: attempt.requestId,
    });
    const failures = await countSignFailuresSince(tx, user.id, failedActions, windowStart(now));
    if (failures >= SIGN_FAILURE_ALERT_AT && failures % SIGN_FAILURE_ALERT_AT === 0) {
      const record = await attempt.describe();
      for (const admin of await findActiveAdministrators(tx)) {
        await enqueueMail(tx, signFailuresAlertMail(admin.email, attempt.alertKind, record, { email: user.email, name: user.displayName }, failures));
      }
    }
  });
  throw new UnprocessableError(`The password is not right; the ${attempt.noun} was not signed.`, { password: 'The password is not right.' });
}

/** Why `signerId` may not sign work written by `authorId` (`wrote`: "this revision"; `step`: "review and sign it"), or null. */
export function ownWorkRefusal(signerId: string, authorId: string | null, wrote: string, step: string): string | null {
  return signerId === authorId ? `You wrote ${wrote}: another QA reviewer must ${step}.` : null;
}

export interface SignatureManifest<M extends string> {
  printedName: string;
  role: Role;
  meaning: M;
  meaningText: string;
  signedAt: Date;
}

/** The signature's manifestation (11.50): the signer's printed name and role, the meaning in words, the time now. */
export function signatureManifest<M extends string>(user: CurrentUser, meaning: M, meaningLabels: Readonly<Record<M, string>>): SignatureManifest<M> {
  return { printedName: user.displayName, role: user.role, meaning, meaningText: meaningLabels[meaning], signedAt: new Date() };
}

/** SHA-256 (hex) of the signed content: the bytes of a rendition, or a text. */
export function signedContentSha256(content: Buffer | string): string {
  return createHash('sha256').update(content).digest('hex');
}

/** 21 CFR 11.300(d): attempted misuse is detected and reported at once to those responsible. */
function signFailuresAlertMail(to: string, kind: string, record: SignedRecordDescription, person: { email: string; name: string }, failures: number) {
  return {
    to,
    kind,
    subject: `Alert: ${failures} failed signing attempts by ${person.email}`,
    text: [
      `${person.name} (${person.email}) entered a wrong password ${failures} times in the last ${SIGN_FAILURE_WINDOW_MINUTES} minutes while signing; the latest attempt was on this ${record.kind}.`,
      '',
      ...record.heading,
      '',
      'If this was not them, deactivate the account at once in Users and ask them to reset their password.',
      `Every attempt is in the audit trail as ${Object.values(signFailureActions).map((a) => `"${a}"`).join(' or ')}.`,
      '',
      record.link,
      '',
      'QuietLayer at Larkspur Coatings',
    ].join('\n'),
  };
}
