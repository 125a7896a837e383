import { describe, expect, it } from 'vitest';
import { DEVELOPMENT_SESSION_SECRET, EnvError, loadEnv } from './env';

const base = { DATABASE_URL: 'postgres://postgres@127.0.0.1:54329/quietlayer' };

describe('loadEnv', () => {
  it('fills the documented defaults', () => {
    const env = loadEnv(base);
    expect(env).toMatchObject({
      HOST: '127.0.0.1',
      PORT: 3000,
      QUIETLAYER_MODE: 'demo',
      PUBLIC_URL: 'http://127.0.0.1:3000',
      SMTP_FAKE_PORT: 2525,
      MAIL_FROM: 'QuietLayer <no-reply@larkspur.example>',
      COOKIE_SECURE: false,
      BCRYPT_COST: 12,
      SESSION_TTL_SECONDS: 28_800,
      LOG_LEVEL: 'info',
      PGPORT: 54_329,
      PGDATA_DIR: '.data/postgres',
      SESSION_SECRET: DEVELOPMENT_SESSION_SECRET,
    });
    expect(env.SMTP_URL).toBeUndefined();
  });

  it('requires DATABASE_URL and names it', () => {
    expect(() => loadEnv({})).toThrow(/DATABASE_URL/);
  });

  it('names the variable and limit for a bad value', () => {
    expect(() => loadEnv({ ...base, PORT: '70000' })).toThrow(/PORT must be at most 65535/);
    expect(() => loadEnv({ ...base, COOKIE_SECURE: 'maybe' })).toThrow(/COOKIE_SECURE/);
    expect(() => loadEnv({ ...base, SESSION_SECRET: 'short' })).toThrow(/at least 32 characters/);
  });

  it('refuses the development secret in production mode and with NODE_ENV=production', () => {
    expect(() => loadEnv({ ...base, QUIETLAYER_MODE: 'production' })).toThrow(EnvError);
    expect(() => loadEnv({ ...base, QUIETLAYER_MODE: 'production' })).toThrow(/development secret/);
    expect(() => loadEnv({ ...base, NODE_ENV: 'production', SESSION_SECRET: DEVELOPMENT_SESSION_SECRET })).toThrow(/SESSION_SECRET/);
  });

  it('refuses a bcrypt cost below 12 in production but allows 4 in tests', () => {
    const secret = 's'.repeat(40);
    expect(() => loadEnv({ ...base, QUIETLAYER_MODE: 'production', SESSION_SECRET: secret, BCRYPT_COST: '10' })).toThrow(/BCRYPT_COST must be at least 12/);
    expect(loadEnv({ ...base, NODE_ENV: 'test', BCRYPT_COST: '4' }).BCRYPT_COST).toBe(4);
  });

  it('defaults to production mode when NODE_ENV=production, and accepts a proper secret', () => {
    const env = loadEnv({ ...base, NODE_ENV: 'production', SESSION_SECRET: 'x'.repeat(48), COOKIE_SECURE: 'true', PUBLIC_URL: 'https://ql.example/' });
    expect(env.QUIETLAYER_MODE).toBe('production');
    expect(env.COOKIE_SECURE).toBe(true);
    expect(env.PUBLIC_URL).toBe('https://ql.example');
  });

  it('treats empty strings as unset', () => {
    expect(loadEnv({ ...base, SMTP_URL: '', PORT: '' })).toMatchObject({ SMTP_URL: undefined, PORT: 3000 });
  });
});
