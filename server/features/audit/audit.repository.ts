import { and, count, desc, gte, ilike, lt, sql, type SQL } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { auditEvents } from '../../db/schema';
import type { AuditEvent, AuditListQuery } from '../../../shared/schemas/audit';
import { escapeLike } from '../../db/escape-like';

export async function listAuditEvents(db: DbOrTx, query: AuditListQuery): Promise<{ items: AuditEvent[]; total: number }> {
  const conditions: SQL[] = [];
  if (query.actor) conditions.push(ilike(auditEvents.actorEmail, `%${escapeLike(query.actor)}%`));
  if (query.entityType) conditions.push(sql`${auditEvents.entityType} = ${query.entityType}`);
  // Dates are whole UTC days; `to` includes its whole day.
  if (query.from) conditions.push(gte(auditEvents.occurredAt, new Date(`${query.from}T00:00:00Z`)));
  if (query.to) conditions.push(lt(auditEvents.occurredAt, new Date(Date.parse(`${query.to}T00:00:00Z`) + 86_400_000)));
  const where = conditions.length > 0 ? and(...conditions) : undefined;

  const [rows, [{ total }]] = await Promise.all([
    db
      .select()
      .from(auditEvents)
      .where(where)
      .orderBy(desc(auditEvents.occurredAt), desc(auditEvents.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(auditEvents).where(where),
  ]);
  return {
    total,
    items: rows.map((row) => ({
      id: row.id,
      actorId: row.actorId,
      actorEmail: row.actorEmail,
      action: row.action,
      entityType: row.entityType,
      entityId: row.entityId,
      before: row.before ?? null,
      after: row.after ?? null,
      reason: row.reason,
      requestId: row.requestId,
      occurredAt: row.occurredAt.toISOString(),
    })),
  };
}
