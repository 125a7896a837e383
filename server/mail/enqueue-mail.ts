import type { DbOrTx } from '../db/client';
import { outboxMessages } from '../db/schema';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** What the message is for, e.g. 'invitation' or 'password-reset'; shown in the outbox. */
  kind: string;
}

/**
 * Queues a message in the outbox (status pending). Pass the open transaction of the change
 * that causes the mail, so the change and its message are committed together or not at all;
 * the outbox dispatcher sends it afterwards. Returns the new outbox row's id.
 */
export async function enqueueMail(dbOrTx: DbOrTx, mail: OutgoingMail): Promise<string> {
  const [row] = await dbOrTx
    .insert(outboxMessages)
    .values({
      toAddress: mail.to,
      subject: mail.subject,
      textBody: mail.text,
      htmlBody: mail.html ?? null,
      kind: mail.kind,
    })
    .returning({ id: outboxMessages.id });
  return row.id;
}
