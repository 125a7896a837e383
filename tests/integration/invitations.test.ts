import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { and, eq } from 'drizzle-orm';
import { auditEvents, deliveredMail, invitations, outboxMessages, users } from '../../server/db/schema';
import { createMailTransport, startOutboxDispatcher, startSmtpFake } from '../../server/mail';
import { createScratchDatabase, type ScratchDatabase } from '../setup/scratch-database';
import { createTestContext, type TestContext } from './helpers/test-app';
import { tokenFromMailText } from './helpers/tokens';
import { createTestUser, signedInAgent, uniqueEmail } from './helpers/users';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

async function outboxFor(email: string) {
  return ctx.db.select().from(outboxMessages).where(eq(outboxMessages.toAddress, email));
}

describe('inviting a user', () => {
  it('writes the invitation, an audit event and an outbox mail whose link sets a password and signs in', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const adminAgent = await signedInAgent(ctx.app, admin);
    const email = uniqueEmail('invitee');

    const invited = await adminAgent
      .post('/api/users/invitations')
      .set('X-Request-Id', 'invite-request-1')
      .send({ email, displayName: 'Rowan Ellery', role: 'reviewer' });

    expect(invited.status).toBe(201);
    expect(invited.body).toMatchObject({ email, displayName: 'Rowan Ellery', role: 'reviewer' });
    // Invitations last 7 days.
    const lifetimeDays = (Date.parse(invited.body.expiresAt) - Date.now()) / 86_400_000;
    expect(lifetimeDays).toBeGreaterThan(6.99);
    expect(lifetimeDays).toBeLessThanOrEqual(7);

    const [mail] = await outboxFor(email);
    expect(mail).toMatchObject({ kind: 'invitation', status: 'pending' });
    expect(mail.textBody).toContain('Rowan Ellery');
    expect(mail.textBody).toContain('QA reviewer');
    const token = tokenFromMailText(mail.textBody, '/accept-invitation');
    expect(mail.textBody).toContain(`http://quietlayer.test/accept-invitation?token=${token}`);
    // Only the SHA-256 of the token is stored.
    const [row] = await ctx.db.select().from(invitations).where(eq(invitations.email, email));
    expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(row.tokenHash).not.toContain(token);

    const [audit] = await ctx.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityId, invited.body.id), eq(auditEvents.action, 'invitation.created')));
    expect(audit).toMatchObject({ actorId: admin.id, actorEmail: admin.email, requestId: 'invite-request-1', entityType: 'invitation' });

    const preview = await request(ctx.app).get(`/api/invitations/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toEqual({ email, displayName: 'Rowan Ellery', role: 'reviewer' });

    const invitee = request.agent(ctx.app);
    const accepted = await invitee.post('/api/invitations/accept').send({ token, password: 'a-long-enough-secret' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({ email, role: 'reviewer', displayName: 'Rowan Ellery' });
    expect((await invitee.get('/api/me')).body.user.email).toBe(email);

    // The new password works for an ordinary sign-in too.
    const signIn = await request(ctx.app).post('/api/auth/sign-in').send({ email, password: 'a-long-enough-secret' });
    expect(signIn.status).toBe(200);

    // Single use: the same link neither previews nor accepts again.
    expect((await request(ctx.app).get(`/api/invitations/${token}`)).status).toBe(404);
    const again = await request(ctx.app).post('/api/invitations/accept').send({ token, password: 'another-long-secret' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('invalid_token');
  });

  it('refuses (409) to invite an e-mail that already has an account, in any letter case', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const existing = await createTestUser(ctx.db);
    const agent = await signedInAgent(ctx.app, admin);
    const response = await agent
      .post('/api/users/invitations')
      .send({ email: existing.email.toUpperCase(), displayName: 'Again', role: 'engineer' });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('conflict');
    expect(response.body.error.fields.email).toBeDefined();
    expect(await outboxFor(existing.email.toUpperCase())).toHaveLength(0);
  });

  it('treats an expired invitation as unknown', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const agent = await signedInAgent(ctx.app, admin);
    const email = uniqueEmail('late');
    await agent.post('/api/users/invitations').send({ email, displayName: 'Late Comer', role: 'technician' });
    const [mail] = await outboxFor(email);
    const token = tokenFromMailText(mail.textBody, '/accept-invitation');
    await ctx.db.update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.email, email));

    expect((await request(ctx.app).get(`/api/invitations/${token}`)).status).toBe(404);
    const accept = await request(ctx.app).post('/api/invitations/accept').send({ token, password: 'a-long-enough-secret' });
    expect(accept.status).toBe(400);
    expect(accept.body.error.code).toBe('invalid_token');
    expect(await ctx.db.select().from(users).where(eq(users.email, email))).toHaveLength(0);
  });

  it('refuses a password shorter than 12 characters when accepting, and creates nothing', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const agent = await signedInAgent(ctx.app, admin);
    const email = uniqueEmail('short');
    await agent.post('/api/users/invitations').send({ email, displayName: 'Short Word', role: 'technician' });
    const token = tokenFromMailText((await outboxFor(email))[0].textBody, '/accept-invitation');

    const response = await request(ctx.app).post('/api/invitations/accept').send({ token, password: 'elevenchars' });
    expect(response.status).toBe(400);
    expect(response.body.error.fields.password).toMatch(/at least 12/);
    expect(await ctx.db.select().from(users).where(eq(users.email, email))).toHaveLength(0);
    expect((await request(ctx.app).get(`/api/invitations/${token}`)).status).toBe(200);
  });
});

describe('delivery through the local SMTP fake (own database, so draining sends only our mail)', () => {
  let scratch: ScratchDatabase;
  let local: TestContext;
  beforeAll(async () => {
    scratch = await createScratchDatabase();
    local = createTestContext({ databaseUrl: scratch.url });
  });
  afterAll(async () => {
    await local.close();
    await scratch.drop();
  });

  it('sends the invitation over SMTP, the fake stores it, the outbox shows it delivered, and its link works', async () => {
    const admin = await createTestUser(local.db, { role: 'administrator' });
    const agent = await signedInAgent(local.app, admin);
    const email = uniqueEmail('delivered');
    expect((await agent.post('/api/users/invitations').send({ email, displayName: 'Sam Ferreira', role: 'engineer' })).status).toBe(201);

    const fake = await startSmtpFake({ db: local.db, port: 0 });
    const transport = createMailTransport({ fakePort: fake.port });
    const dispatcher = startOutboxDispatcher({ db: local.db, transport, from: local.env.MAIL_FROM, intervalMs: 60_000 });
    try {
      expect(await dispatcher.drain()).toBe(1);
    } finally {
      await dispatcher.stop();
      transport.close();
      await fake.close();
    }

    const [received] = await local.db.select().from(deliveredMail).where(eq(deliveredMail.toAddresses, email));
    expect(received.subject).toBe('You are invited to QuietLayer');

    const outbox = await agent.get('/api/outbox');
    expect(outbox.status).toBe(200);
    expect(outbox.body.total).toBe(1);
    expect(outbox.body.items[0]).toMatchObject({ toAddress: email, kind: 'invitation', status: 'sent', delivered: true });

    const token = tokenFromMailText(received.textBody ?? '', '/accept-invitation');
    const accepted = await request(local.app).post('/api/invitations/accept').send({ token, password: 'delivered-by-smtp' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user.email).toBe(email);
  });
});
