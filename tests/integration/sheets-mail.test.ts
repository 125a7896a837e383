import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deliveredMail, outboxMessages } from '../../server/db/schema';
import { createMailTransport, startOutboxDispatcher, startSmtpFake } from '../../server/mail';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent } from './helpers/users';
import { roundFluid } from './helpers/round-fluid';

// A database of its own: the dispatcher sends every pending message, and other files queue mail too.
let scratch: ScratchDatabase;
let ctx: TestContext;

beforeAll(async () => {
  scratch = await createScratchDatabase();
  ctx = createTestContext({ databaseUrl: scratch.url });
});

afterAll(async () => {
  await ctx?.close();
  await scratch?.drop();
});

describe('process sheet e-mail through the outbox and the local SMTP fake', () => {
  it('delivers the review request to every reviewer and the signing notice to the author, each with the link to the sheet', async () => {
    const author = await createTestUser(ctx.db, { role: 'engineer', label: 'author' });
    const reviewerA = await createTestUser(ctx.db, { role: 'reviewer', label: 'qa-a' });
    const reviewerB = await createTestUser(ctx.db, { role: 'reviewer', label: 'qa-b' });
    const engineer = await signedInAgent(ctx.app, author);
    const qa = await signedInAgent(ctx.app, reviewerA);
    const fluid = await engineer.post('/api/fluids').send({
      name: 'Mail test fluid',
      ...roundFluid,
    });
    expect(fluid.status).toBe(201);
    const check = await engineer.post('/api/layer-checks').send({
      title: 'Mail test check',
      fluidId: fluid.body.id,
      processKind: 'drying-coat',
      temperature: '20 °C',
      depth: '1 mm',
      bottom: { mechanics: 'rigid', thermal: 'conducting' },
      top: 'surface',
      deformableSurface: false,
      heating: { mode: 'deltaT', deltaT: '0.2 K' },
    });
    expect(check.status).toBe(201);
    const sheet = await engineer.post('/api/sheets').send({ checkId: check.body.id, line: 'Line 2', purpose: 'Mail test.' });
    expect(sheet.status).toBe(201);
    expect((await engineer.post(`/api/sheets/${sheet.body.id}/submit`)).status).toBe(200);
    expect((await qa.post(`/api/sheets/${sheet.body.id}/sign`).send({ password: reviewerA.password, meaning: 'approved-for-production' })).status).toBe(200);

    const queued = await ctx.db.select().from(outboxMessages);
    expect(queued.every((m) => m.status === 'pending')).toBe(true);
    expect(queued.map((m) => `${m.kind} ${m.toAddress}`).sort()).toEqual(
      [`sheet-review-request ${reviewerA.email}`, `sheet-review-request ${reviewerB.email}`, `sheet-signed ${author.email}`].sort(),
    );

    const fake = await startSmtpFake({ db: ctx.db, port: 0 });
    const dispatcher = startOutboxDispatcher({ db: ctx.db, transport: createMailTransport({ fakePort: fake.port }), from: ctx.env.MAIL_FROM, intervalMs: 3_600_000 });
    try {
      expect(await dispatcher.drain()).toBe(3);
    } finally {
      await dispatcher.stop();
      await fake.close();
    }
    const link = `http://quietlayer.test/sheets/${sheet.body.id}`;
    for (const to of [reviewerA.email, reviewerB.email, author.email]) {
      const [received] = await ctx.db.select().from(deliveredMail).where(eq(deliveredMail.toAddresses, to));
      expect(received, to).toBeDefined();
      expect(received.textBody).toContain(link);
      expect(received.subject).toContain(sheet.body.number);
    }
    const sent = await ctx.db.select().from(outboxMessages);
    expect(sent.every((m) => m.status === 'sent')).toBe(true);
  });
});
