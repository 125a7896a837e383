import { eq } from 'drizzle-orm';
import type { Pool } from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createScratchDatabase, type ScratchDatabase } from '../../tests/setup/scratch-database';
import { createDatabase, type Database } from '../db/client';
import { deliveredMail } from '../db/schema';
import { createMailTransport } from './mail-transport';
import { SMTP_FAKE_MAX_MESSAGE_BYTES, startSmtpFake, type SmtpFake } from './smtp-fake';

let scratch: ScratchDatabase;
let db: Database;
let pool: Pool;
let fake: SmtpFake;

beforeAll(async () => {
  scratch = await createScratchDatabase();
  ({ db, pool } = createDatabase(scratch.url));
  fake = await startSmtpFake({ db, port: 0 });
});

afterAll(async () => {
  await fake?.close();
  await pool?.end();
  await scratch?.drop();
});

describe('startSmtpFake', () => {
  it('listens on a free port when asked for port 0', () => {
    expect(fake.port).toBeGreaterThan(0);
  });

  it('stores every envelope recipient of a message', async () => {
    const transport = createMailTransport({ fakePort: fake.port });
    const info = await transport.sendMail({
      from: 'QuietLayer <no-reply@larkspur.example>',
      to: 'technician@larkspur.example',
      cc: 'reviewer@larkspur.example',
      subject: 'Gauge log reading out of range',
      text: 'Line 2, zone 3: wet film 41 µm against a window of 30–38 µm.',
    });
    const [row] = await db.select().from(deliveredMail).where(eq(deliveredMail.smtpMessageId, info.messageId));
    expect(row.toAddresses).toBe('technician@larkspur.example, reviewer@larkspur.example');
    expect(row.textBody?.trim()).toBe('Line 2, zone 3: wet film 41 µm against a window of 30–38 µm.');
    expect(row.htmlBody).toBeNull();
  });

  it('refuses a message larger than its size limit and stores nothing', async () => {
    const transport = createMailTransport({ fakePort: fake.port });
    const subject = `oversized ${Date.now()}`;
    await expect(
      transport.sendMail({
        from: 'no-reply@larkspur.example',
        to: 'admin@larkspur.example',
        subject,
        text: 'x'.repeat(SMTP_FAKE_MAX_MESSAGE_BYTES + 1024),
      }),
    ).rejects.toMatchObject({ responseCode: 552 });
    const rows = await db.select().from(deliveredMail).where(eq(deliveredMail.subject, subject));
    expect(rows).toHaveLength(0);
  });

  it('refuses to start on a port that is already taken', async () => {
    await expect(startSmtpFake({ db, port: fake.port })).rejects.toThrow(/EADDRINUSE/);
  });
});
