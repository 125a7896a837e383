import type { Database } from '../../db/client';
import type { Env } from '../../env';
import { ConflictError, InvalidTokenError, NotFoundError } from '../../errors';
import { hashPassword } from '../../auth/passwords';
import { hashToken } from '../../auth/tokens';
import type { Me } from '../../../shared/schemas/auth';
import type { Role } from '../../../shared/schemas/roles';
import { recordAuditEvent } from '../audit/record-audit-event';
import { emailHasAccount } from '../users/users.repository';
import { claimOpenInvitation, findOpenInvitation, insertUser, markInvitationUsed } from './invitations.repository';

/** What the accept-invitation page shows before the person picks a password. 404 when unknown, used or expired. */
export async function previewInvitation(db: Database, token: string): Promise<{ email: string; displayName: string; role: Role }> {
  const invitation = await findOpenInvitation(db, hashToken(token));
  if (!invitation) throw new NotFoundError('This invitation is not valid any more: it may have expired or been used. Ask an administrator for a new one.');
  return { email: invitation.email, displayName: invitation.displayName, role: invitation.role };
}

/**
 * Accept an invitation: creates the account with the chosen password, uses up the
 * invitation and records it, all in one transaction. 400 'invalid_token' for an unknown,
 * used or expired token; 409 when an account with the e-mail exists by now.
 */
export async function acceptInvitation(
  db: Database,
  env: Pick<Env, 'BCRYPT_COST'>,
  input: { token: string; password: string },
  meta: { requestId: string },
): Promise<Me> {
  const passwordHash = await hashPassword(input.password, env.BCRYPT_COST);
  return db.transaction(async (tx) => {
    const invitation = await claimOpenInvitation(tx, hashToken(input.token));
    if (!invitation) throw new InvalidTokenError();
    if (await emailHasAccount(tx, invitation.email)) {
      throw new ConflictError('An account with this e-mail address already exists; sign in or ask for a password reset.');
    }
    const user = await insertUser(tx, {
      email: invitation.email,
      displayName: invitation.displayName,
      role: invitation.role,
      passwordHash,
    });
    await markInvitationUsed(tx, invitation.id);
    await recordAuditEvent(tx, {
      actor: { id: user.id, email: user.email },
      action: 'user.created_from_invitation',
      entityType: 'user',
      entityId: user.id,
      after: { email: user.email, displayName: user.displayName, role: user.role, active: user.active, invitationId: invitation.id },
      requestId: meta.requestId,
    });
    return { id: user.id, email: user.email, displayName: user.displayName, role: user.role };
  });
}
