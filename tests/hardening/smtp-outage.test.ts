/**
 * Fault: the mail relay (here the local SMTP fake) is down. A change that sends mail still succeeds,
 * because the mail is written to the outbox in the same transaction; the dispatcher keeps it pending
 * with the error and retries with back-off, and sends it once the relay is back.
 */
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { deliveredMail, outboxMessages, users } from '../../server/db/schema';
import { createMailTransport, startOutboxDispatcher, startSmtpFake, type SmtpFake } from '../../server/mail';
import type { OutboxDispatcher } from '../../server/mail/outbox-dispatcher';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';
import { createTestContext, type TestContext } from '../integration/helpers/test-app';
import { createTestUser, signedInAgent, uniqueEmail } from '../integration/helpers/users';
import { freePort } from './support/throwaway-postgres';

let database: ScratchDatabase;
let ctx: TestContext;
let admin: TestAgent;
let dispatcher: OutboxDispatcher;
let fake: SmtpFake | undefined;
let smtpPort: number;

beforeAll(async () => {
  database = await createScratchDatabase(); // its own outbox: this file drains every pending message
  ctx = createTestContext({ databaseUrl: database.url });
  admin = await signedInAgent(ctx.app, await createTestUser(ctx.db, { role: 'administrator' }));
  smtpPort = await freePort(); // nothing listens here yet: the relay is "down"
  const transport = createMailTransport({ fakePort: smtpPort });
  dispatcher = startOutboxDispatcher({ db: ctx.db, transport, from: 'QuietLayer <no-reply@larkspur.example>', intervalMs: 200 });
}, 60_000);

afterAll(async () => {
  await dispatcher?.stop();
  await fake?.close();
  await ctx?.close();
  await database?.drop();
});

async function waitFor<T>(read: () => Promise<T>, done: (value: T) => boolean, ms: number): Promise<T> {
  const deadline = Date.now() + ms;
  let value = await read();
  while (!done(value) && Date.now() < deadline) {
    await new Promise((resolve) => setTimeout(resolve, 100));
    value = await read();
  }
  return value;
}

describe('SMTP relay down', () => {
  it('the invitation is stored and answered 201; its mail waits, then goes out when the relay returns', async () => {
    const email = uniqueEmail('mail-outage');
    const invited = await admin.post('/api/users/invitations').send({ email, displayName: 'Mail Outage', role: 'technician' });
    expect(invited.status).toBe(201);

    const message = () => ctx.db.select().from(outboxMessages).where(eq(outboxMessages.toAddress, email)).then((rows) => rows[0]);
    const failed = await waitFor(message, (m) => m !== undefined && m.attempts >= 1, 15_000);
    expect(failed.status).toBe('pending');
    expect(failed.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(failed.sentAt).toBeNull();
    // Nobody has the account yet: the invitation, not a user, was created.
    expect(await ctx.db.select().from(users).where(eq(users.email, email))).toEqual([]);

    fake = await startSmtpFake({ db: ctx.db, port: smtpPort });

    // First retry 2 s after the failure, then doubling (outbox-dispatcher.ts); allow several.
    const sent = await waitFor(message, (m) => m.status === 'sent', 30_000);
    expect(sent.status).toBe('sent');
    expect(sent.attempts).toBeGreaterThanOrEqual(2);
    const inbox = await ctx.db.select().from(deliveredMail).where(eq(deliveredMail.toAddresses, email));
    expect(inbox).toHaveLength(1);
    expect(inbox[0].textBody).toMatch(/\/accept-invitation\?token=/);
  }, 60_000);
});
