import { eq, sql } from 'drizzle-orm';
import type { Pool } from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createScratchDatabase, type ScratchDatabase } from '../../tests/setup/scratch-database';
import { createDatabase, type Database } from '../db/client';
import { deliveredMail, outboxMessages } from '../db/schema';
import { enqueueMail } from './enqueue-mail';
import { createMailTransport } from './mail-transport';
import { MAX_DELIVERY_ATTEMPTS, retryDelayMs, startOutboxDispatcher } from './outbox-dispatcher';
import { startSmtpFake } from './smtp-fake';

const FROM = 'QuietLayer <no-reply@larkspur.example>';
// The dispatcher's own timer must not race the explicit drain() calls below.
const NEVER_POLL_MS = 3_600_000;

let scratch: ScratchDatabase;
let db: Database;
let pool: Pool;

beforeAll(async () => {
  // A database of our own: drain() sends every due message, and other files queue mail too.
  scratch = await createScratchDatabase();
  ({ db, pool } = createDatabase(scratch.url));
});

afterAll(async () => {
  await pool?.end();
  await scratch?.drop();
});

/** A port that was free a moment ago: start a fake on port 0, note the port, close it. */
async function freePort(): Promise<number> {
  const probe = await startSmtpFake({ db, port: 0 });
  await probe.close();
  return probe.port;
}

async function outboxRow(id: string) {
  const [row] = await db.select().from(outboxMessages).where(eq(outboxMessages.id, id));
  return row;
}

describe('outbox dispatcher with the local SMTP fake', () => {
  it('delivers a queued message to the fake, which stores it parsed in delivered_mail', async () => {
    const fake = await startSmtpFake({ db, port: 0 });
    const dispatcher = startOutboxDispatcher({ db, transport: createMailTransport({ fakePort: fake.port }), from: FROM, intervalMs: NEVER_POLL_MS });
    try {
      const id = await db.transaction((tx) =>
        enqueueMail(tx, {
          to: 'new.hire@larkspur.example',
          subject: 'You are invited to QuietLayer',
          text: 'Set your password: http://127.0.0.1:3000/accept-invitation?token=abc',
          html: '<p>Set your password: <a href="http://127.0.0.1:3000/accept-invitation?token=abc">link</a></p>',
          kind: 'invitation',
        }),
      );
      expect((await outboxRow(id)).status).toBe('pending');

      expect(await dispatcher.drain()).toBe(1);

      const sent = await outboxRow(id);
      expect(sent.status).toBe('sent');
      expect(sent.attempts).toBe(1);
      expect(sent.sentAt).toBeInstanceOf(Date);
      expect(sent.smtpMessageId).toMatch(/^<.+@.+>$/);

      const [received] = await db.select().from(deliveredMail).where(eq(deliveredMail.smtpMessageId, sent.smtpMessageId!));
      expect(received.toAddresses).toBe('new.hire@larkspur.example');
      expect(received.fromAddress).toContain('no-reply@larkspur.example');
      expect(received.subject).toBe('You are invited to QuietLayer');
      expect(received.textBody?.trim()).toBe('Set your password: http://127.0.0.1:3000/accept-invitation?token=abc');
      expect(received.htmlBody).toContain('href="http://127.0.0.1:3000/accept-invitation?token=abc"');
    } finally {
      await dispatcher.stop();
      await fake.close();
    }
  });

  it('keeps a message pending with its error while the mail server is down, and sends it once it is back', async () => {
    const port = await freePort();
    const dispatcher = startOutboxDispatcher({ db, transport: createMailTransport({ fakePort: port }), from: FROM, intervalMs: NEVER_POLL_MS });
    let fake: Awaited<ReturnType<typeof startSmtpFake>> | undefined;
    try {
      const id = await enqueueMail(db, { to: 'engineer@larkspur.example', subject: 'Reset your password', text: 'reset link', kind: 'password-reset' });

      expect(await dispatcher.drain()).toBe(0);
      const failedOnce = await outboxRow(id);
      expect(failedOnce.status).toBe('pending');
      expect(failedOnce.attempts).toBe(1);
      expect(failedOnce.lastError).toMatch(/ECONNREFUSED|connect/i);
      const [{ secondsAhead }] = await db
        .select({ secondsAhead: sql<number>`extract(epoch from ${outboxMessages.nextAttemptAt} - now())::float8` })
        .from(outboxMessages)
        .where(eq(outboxMessages.id, id));
      expect(secondsAhead).toBeGreaterThan(1);

      fake = await startSmtpFake({ db, port });
      // Back-off not yet elapsed: nothing is due, nothing is sent.
      expect(await dispatcher.drain()).toBe(0);
      // Let the back-off elapse (move the due time instead of sleeping).
      await db.update(outboxMessages).set({ nextAttemptAt: sql`now()` }).where(eq(outboxMessages.id, id));
      expect(await dispatcher.drain()).toBe(1);

      const sent = await outboxRow(id);
      expect(sent.status).toBe('sent');
      expect(sent.attempts).toBe(2);
      expect(sent.lastError).toBeNull();
      const received = await db.select().from(deliveredMail).where(eq(deliveredMail.smtpMessageId, sent.smtpMessageId!));
      expect(received).toHaveLength(1);
      expect(received[0].subject).toBe('Reset your password');
    } finally {
      await dispatcher.stop();
      await fake?.close();
    }
  });

  it('marks a message failed after the last allowed attempt', async () => {
    const port = await freePort();
    const dispatcher = startOutboxDispatcher({ db, transport: createMailTransport({ fakePort: port }), from: FROM, intervalMs: NEVER_POLL_MS });
    try {
      const id = await enqueueMail(db, { to: 'reviewer@larkspur.example', subject: 'Never arrives', text: 'x', kind: 'test' });
      await db.update(outboxMessages).set({ attempts: MAX_DELIVERY_ATTEMPTS - 1 }).where(eq(outboxMessages.id, id));

      await dispatcher.drain();

      const row = await outboxRow(id);
      expect(row.status).toBe('failed');
      expect(row.attempts).toBe(MAX_DELIVERY_ATTEMPTS);
      expect(row.lastError).not.toBeNull();
    } finally {
      await dispatcher.stop();
    }
  });

  it('writes no message when the transaction that queued it rolls back', async () => {
    const subject = `rolled back ${Date.now()}`;
    await expect(
      db.transaction(async (tx) => {
        await enqueueMail(tx, { to: 'admin@larkspur.example', subject, text: 'x', kind: 'test' });
        throw new Error('the state change failed');
      }),
    ).rejects.toThrow('the state change failed');
    const rows = await db.select().from(outboxMessages).where(eq(outboxMessages.subject, subject));
    expect(rows).toHaveLength(0);
  });

  it('sends each message exactly once when two dispatchers drain at the same time', async () => {
    const fake = await startSmtpFake({ db, port: 0 });
    const make = () => startOutboxDispatcher({ db, transport: createMailTransport({ fakePort: fake.port }), from: FROM, intervalMs: NEVER_POLL_MS });
    const first = make();
    const second = make();
    const kind = `concurrency-${Date.now()}`;
    try {
      for (let n = 0; n < 25; n += 1) {
        await enqueueMail(db, { to: `person${n}@larkspur.example`, subject: `${kind} #${n}`, text: 'x', kind });
      }
      const [sentByFirst, sentBySecond] = await Promise.all([first.drain(), second.drain()]);
      expect(sentByFirst + sentBySecond).toBe(25);

      const received = await db
        .select({ subject: deliveredMail.subject })
        .from(deliveredMail)
        .where(sql`${deliveredMail.subject} like ${`${kind} #%`}`);
      expect(received).toHaveLength(25);
      expect(new Set(received.map((row) => row.subject)).size).toBe(25);
    } finally {
      await first.stop();
      await second.stop();
      await fake.close();
    }
  });
});

describe('retryDelayMs', () => {
  it('doubles from 2 s after each failure and stops growing at 5 minutes', () => {
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([2_000, 4_000, 8_000, 16_000]);
    expect(retryDelayMs(8)).toBe(256_000);
    expect(retryDelayMs(9)).toBe(300_000);
    expect(retryDelayMs(MAX_DELIVERY_ATTEMPTS)).toBe(300_000);
  });
});
