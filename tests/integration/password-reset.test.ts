import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { outboxMessages, passwordResetTokens, users } from '../../server/db/schema';
import { hashToken } from '../../server/auth/tokens';
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

const outboxFor = (email: string) => ctx.db.select().from(outboxMessages).where(eq(outboxMessages.toAddress, email));

describe('password reset', () => {
  it('answers 202 for an unknown e-mail and sends nothing', async () => {
    const email = uniqueEmail('ghost');
    const response = await request(ctx.app).post('/api/auth/password-reset/request').send({ email });
    expect(response.status).toBe(202);
    expect(await outboxFor(email)).toHaveLength(0);
  });

  it('answers 202 for an inactive account and sends nothing', async () => {
    const user = await createTestUser(ctx.db, { active: false });
    expect((await request(ctx.app).post('/api/auth/password-reset/request').send({ email: user.email })).status).toBe(202);
    expect(await outboxFor(user.email)).toHaveLength(0);
  });

  it('mails a one-hour link; the link sets a new password once, ends old sessions and clears a lock', async () => {
    const user = await createTestUser(ctx.db);
    const oldSession = await signedInAgent(ctx.app, user);

    const requested = await request(ctx.app).post('/api/auth/password-reset/request').send({ email: user.email });
    const unknown = await request(ctx.app).post('/api/auth/password-reset/request').send({ email: uniqueEmail('ghost') });
    expect(requested.status).toBe(202);
    expect(requested.body).toEqual(unknown.body); // the answer does not tell whether the account exists

    const [mail] = await outboxFor(user.email);
    expect(mail.kind).toBe('password-reset');
    const token = tokenFromMailText(mail.textBody, '/reset-password');
    expect(mail.textBody).toContain(`http://quietlayer.test/reset-password?token=${token}`);
    const [stored] = await ctx.db.select().from(passwordResetTokens).where(eq(passwordResetTokens.tokenHash, hashToken(token)));
    const lifetimeMinutes = (stored.expiresAt.getTime() - Date.now()) / 60_000;
    expect(lifetimeMinutes).toBeGreaterThan(59);
    expect(lifetimeMinutes).toBeLessThanOrEqual(60);

    // Locked by failed sign-ins meanwhile: the reset clears the lock.
    await ctx.db.update(users).set({ failedSignIns: 7, lockedUntil: new Date(Date.now() + 3_600_000) }).where(eq(users.id, user.id));
    const confirmed = await request(ctx.app).post('/api/auth/password-reset/confirm').send({ token, password: 'brand-new-password' });
    expect(confirmed.status).toBe(204);

    expect((await oldSession.get('/api/me')).status).toBe(401);
    const oldPassword = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password });
    expect(oldPassword.status).toBe(401);
    const newPassword = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: 'brand-new-password' });
    expect(newPassword.status).toBe(200);

    const reused = await request(ctx.app).post('/api/auth/password-reset/confirm').send({ token, password: 'yet-another-password' });
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe('invalid_token');
  });

  it('refuses an expired token and an unknown token with invalid_token', async () => {
    const user = await createTestUser(ctx.db);
    await request(ctx.app).post('/api/auth/password-reset/request').send({ email: user.email });
    const token = tokenFromMailText((await outboxFor(user.email))[0].textBody, '/reset-password');
    await ctx.db
      .update(passwordResetTokens)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(passwordResetTokens.tokenHash, hashToken(token)));

    const expired = await request(ctx.app).post('/api/auth/password-reset/confirm').send({ token, password: 'brand-new-password' });
    expect(expired.status).toBe(400);
    expect(expired.body.error.code).toBe('invalid_token');
    const unknown = await request(ctx.app)
      .post('/api/auth/password-reset/confirm')
      .send({ token: 'A'.repeat(43), password: 'brand-new-password' });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.code).toBe('invalid_token');
    // The password did not change.
    expect((await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password })).status).toBe(200);
  });

  it('refuses a new password shorter than 12 characters and keeps the token usable', async () => {
    const user = await createTestUser(ctx.db);
    await request(ctx.app).post('/api/auth/password-reset/request').send({ email: user.email });
    const token = tokenFromMailText((await outboxFor(user.email))[0].textBody, '/reset-password');
    const short = await request(ctx.app).post('/api/auth/password-reset/confirm').send({ token, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toMatch(/at least 12 characters/);
    const ok = await request(ctx.app).post('/api/auth/password-reset/confirm').send({ token, password: 'twelve-chars' });
    expect(ok.status).toBe(204);
  });
});
