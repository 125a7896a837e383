import type { Database } from '../../db/client';
import type { Env } from '../../env';
import { ConflictError, NotFoundError, UnprocessableError } from '../../errors';
import { enqueueMail } from '../../mail/enqueue-mail';
import { createToken, INVITATION_TTL_MS } from '../../auth/tokens';
import type { InviteUserInput, UpdateUserInput, User } from '../../../shared/schemas/users';
import { recordAuditEvent, type AuditActor } from '../audit/record-audit-event';
import { invitationMail } from './invitation-mail';
import {
  emailHasAccount,
  findUserByIdForUpdate,
  insertInvitation,
  lockActiveAdministrators,
  listUsers as listUserRows,
  toUser,
  updateUserRow,
} from './users.repository';

export interface Invitation {
  id: string;
  email: string;
  displayName: string;
  role: User['role'];
  expiresAt: string;
}

/** Users, filtered by `q` (a piece of the e-mail or name), ordered by e-mail. */
export function listUsers(db: Database, query: { q?: string; page: number; pageSize: number }) {
  return listUserRows(db, query);
}

/**
 * Invite someone by e-mail. The invitation, its audit event and its mail are written in one
 * transaction: all of them or none. Refuses (409) an e-mail that already has an account.
 */
export async function inviteUser(
  db: Database,
  env: Pick<Env, 'PUBLIC_URL'>,
  actor: AuditActor & { displayName: string },
  input: InviteUserInput,
  meta: { requestId: string },
  now = new Date(),
): Promise<Invitation> {
  if (await emailHasAccount(db, input.email)) {
    throw new ConflictError('An account with this e-mail address already exists.', { email: 'An account with this e-mail address already exists.' });
  }
  const { token, tokenHash } = createToken();
  const expiresAt = new Date(now.getTime() + INVITATION_TTL_MS);
  const link = `${env.PUBLIC_URL}/accept-invitation?token=${encodeURIComponent(token)}`;
  return db.transaction(async (tx) => {
    const row = await insertInvitation(tx, {
      email: input.email,
      displayName: input.displayName,
      role: input.role,
      tokenHash,
      invitedBy: actor.id,
      expiresAt,
    });
    const invitation: Invitation = {
      id: row.id,
      email: row.email,
      displayName: row.displayName,
      role: row.role,
      expiresAt: row.expiresAt.toISOString(),
    };
    await recordAuditEvent(tx, {
      actor,
      action: 'invitation.created',
      entityType: 'invitation',
      entityId: row.id,
      after: invitation,
      requestId: meta.requestId,
    });
    await enqueueMail(
      tx,
      invitationMail({ to: row.email, displayName: row.displayName, role: row.role, invitedBy: actor.displayName, link, expiresAt }),
    );
    return invitation;
  });
}

/**
 * Change a user's role and/or active flag. Rules (422): nobody deactivates their own account,
 * and the last active administrator cannot be demoted or deactivated.
 */
export async function updateUser(
  db: Database,
  actor: AuditActor,
  userId: string,
  input: UpdateUserInput,
  meta: { requestId: string },
): Promise<User> {
  return db.transaction(async (tx) => {
    const activeAdministrators = await lockActiveAdministrators(tx);
    const target = await findUserByIdForUpdate(tx, userId);
    if (!target) throw new NotFoundError('No user with this id.');

    if (input.active === false && target.id === actor.id) {
      throw new UnprocessableError('You cannot deactivate your own account; ask another administrator.', {
        active: 'You cannot deactivate your own account.',
      });
    }
    const isActiveAdministrator = target.role === 'administrator' && target.active;
    const losesAdministrator = (input.role !== undefined && input.role !== 'administrator') || input.active === false;
    if (isActiveAdministrator && losesAdministrator && activeAdministrators <= 1) {
      const message = 'QuietLayer needs at least one active administrator; make someone else an administrator first.';
      throw new UnprocessableError(message, input.active === false ? { active: message } : { role: message });
    }

    const changes: { role?: User['role']; active?: boolean } = {};
    if (input.role !== undefined && input.role !== target.role) changes.role = input.role;
    if (input.active !== undefined && input.active !== target.active) changes.active = input.active;
    if (Object.keys(changes).length === 0) return toUser(target);

    const updated = await updateUserRow(tx, target.id, changes);
    await recordAuditEvent(tx, {
      actor,
      action: 'user.updated',
      entityType: 'user',
      entityId: target.id,
      before: { role: target.role, active: target.active },
      after: { role: updated.role, active: updated.active },
      requestId: meta.requestId,
    });
    return toUser(updated);
  });
}
