import { sql } from 'drizzle-orm';
import { index, integer, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

export const outboxStatusEnum = pgEnum('outbox_status', ['pending', 'sent', 'failed']);

/**
 * Outgoing e-mail. A state change writes its message here in the same transaction,
 * and the dispatcher sends it through nodemailer, retrying with back-off, so a mail
 * server that is down never loses the change or the message.
 */
export const outboxMessages = pgTable(
  'outbox_messages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    textBody: text('text_body').notNull(),
    htmlBody: text('html_body'),
    kind: text('kind').notNull(),
    status: outboxStatusEnum('status').notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    smtpMessageId: text('smtp_message_id'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('outbox_pending_idx').on(table.status, table.nextAttemptAt).where(sql`status = 'pending'`)],
);

/**
 * What the local SMTP fake received, parsed with mailparser: the demo "inbox" that
 * administrators can read at /admin/outbox. Empty when SMTP_URL points at a real relay.
 */
export const deliveredMail = pgTable('delivered_mail', {
  id: uuid('id').primaryKey().defaultRandom(),
  smtpMessageId: text('smtp_message_id'),
  fromAddress: text('from_address'),
  toAddresses: text('to_addresses').notNull(),
  subject: text('subject'),
  textBody: text('text_body'),
  htmlBody: text('html_body'),
  receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
});
