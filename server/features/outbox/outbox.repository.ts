import { count, desc, sql } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { deliveredMail, outboxMessages } from '../../db/schema';
import type { OutboxMessage } from '../../../shared/schemas/outbox';
import type { PageQuery } from '../../../shared/schemas/api-error';

/**
 * Outgoing mail, newest first. `delivered` is true when the local SMTP fake stored a message
 * with the same Message-ID (compared without angle brackets, which senders and parsers treat differently).
 */
export async function listOutboxMessages(db: DbOrTx, query: PageQuery): Promise<{ items: OutboxMessage[]; total: number }> {
  const delivered = sql<boolean>`exists (
    select 1 from ${deliveredMail}
    where ${outboxMessages.smtpMessageId} is not null
      and btrim(${deliveredMail.smtpMessageId}, '<>') = btrim(${outboxMessages.smtpMessageId}, '<>')
  )`;
  const [rows, [{ total }]] = await Promise.all([
    db
      .select({
        id: outboxMessages.id,
        toAddress: outboxMessages.toAddress,
        subject: outboxMessages.subject,
        textBody: outboxMessages.textBody,
        kind: outboxMessages.kind,
        status: outboxMessages.status,
        attempts: outboxMessages.attempts,
        lastError: outboxMessages.lastError,
        createdAt: outboxMessages.createdAt,
        sentAt: outboxMessages.sentAt,
        delivered,
      })
      .from(outboxMessages)
      .orderBy(desc(outboxMessages.createdAt), desc(outboxMessages.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ total: count() }).from(outboxMessages),
  ]);
  return {
    total,
    items: rows.map((row) => ({
      ...row,
      delivered: Boolean(row.delivered),
      createdAt: row.createdAt.toISOString(),
      sentAt: row.sentAt ? row.sentAt.toISOString() : null,
    })),
  };
}
