import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Database } from '../db/client';
import { deliveredMail } from '../db/schema';

/** Largest message the fake accepts (bytes); the invitation and reset mails are a few kB. */
export const SMTP_FAKE_MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

export interface SmtpFakeOptions {
  db: Database;
  /** 0 picks a free port. */
  port: number;
  host?: string;
}

export interface SmtpFake {
  port: number;
  close(): Promise<void>;
}

/**
 * A local SMTP server standing in for a real relay in demo mode and in tests: it accepts every
 * message on loopback (no TLS, no authentication), parses it with mailparser and stores it in
 * `delivered_mail`, the demo inbox administrators read at /admin/outbox.
 */
export async function startSmtpFake({ db, port, host = '127.0.0.1' }: SmtpFakeOptions): Promise<SmtpFake> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: SMTP_FAKE_MAX_MESSAGE_BYTES,
    banner: 'QuietLayer local mail fake',
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
            const tooLarge = new Error(`message exceeds ${SMTP_FAKE_MAX_MESSAGE_BYTES} bytes`) as Error & { responseCode: number };
            tooLarge.responseCode = 552;
            throw tooLarge;
          }
          const recipients = session.envelope.rcptTo.map((recipient) => recipient.address);
          await db.insert(deliveredMail).values({
            smtpMessageId: parsed.messageId ?? null,
            fromAddress: parsed.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : null),
            toAddresses: recipients.join(', '),
            subject: parsed.subject ?? null,
            textBody: parsed.text ?? null,
            htmlBody: typeof parsed.html === 'string' ? parsed.html : null,
          });
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
  server.on('error', () => {
    // Connection-level errors (a client hanging up) are not fatal for the fake.
  });

  await new Promise<void>((resolve, reject) => {
    const onError = (error: Error) => reject(error);
    server.server.once('error', onError);
    server.listen(port, host, () => {
      server.server.off('error', onError);
      resolve();
    });
  });
  const address = server.server.address() as AddressInfo;

  let closing: Promise<void> | undefined;
  return {
    port: address.port,
    close() {
      closing ??= new Promise<void>((resolve) => server.close(() => resolve()));
      return closing;
    },
  };
}
