import type { DbOrTx } from '../../db/client';
import { auditEvents } from '../../db/schema';

/** Who did it: a signed-in person, or null for the system / an anonymous request. */
export interface AuditActor {
  id: string;
  email: string;
}

export interface AuditEventInput {
  actor: AuditActor | null;
  /** What happened, `<entity>.<verb>` in the past tense, e.g. `user.role_changed`. */
  action: string;
  entityType: string;
  entityId: string | null;
  before?: unknown;
  after?: unknown;
  reason?: string | null;
  requestId?: string | null;
}

/**
 * Append one event to the audit trail. Call it with the same transaction as the change it
 * describes, so the change and its record commit (or roll back) together. The table is
 * append-only: a database trigger rejects UPDATE and DELETE.
 */
export async function recordAuditEvent(db: DbOrTx, event: AuditEventInput): Promise<void> {
  await db.insert(auditEvents).values({
    actorId: event.actor?.id ?? null,
    actorEmail: event.actor?.email ?? null,
    action: event.action,
    entityType: event.entityType,
    entityId: event.entityId,
    before: event.before ?? null,
    after: event.after ?? null,
    reason: event.reason ?? null,
    requestId: event.requestId || null,
  });
}
