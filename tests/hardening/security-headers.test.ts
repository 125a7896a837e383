/**
 * Response headers: a Content-Security-Policy that allows only the app's own scripts and styles
 * (W3C, "Content Security Policy Level 3"), no inline script, no framing; HSTS only over HTTPS
 * (RFC 6797 §7.2: a host must not send it over plain HTTP).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestContext, type TestContext } from '../integration/helpers/test-app';

function directives(header: string): Map<string, string[]> {
  return new Map(
    header
      .split(';')
      .map((part) => part.trim())
      .filter(Boolean)
      .map((part) => {
        const [name, ...values] = part.split(/\s+/);
        return [name, values] as [string, string[]];
      }),
  );
}

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(async () => {
  await ctx.close();
});

describe('Content-Security-Policy', () => {
  it('allows scripts and styles from the app itself only: no inline, no eval, no other hosts', async () => {
    const response = await request(ctx.app).get('/api/health');
    const csp = directives(response.headers['content-security-policy']);
    expect(csp.get('default-src')).toEqual(["'self'"]);
    expect(csp.get('script-src')).toEqual(["'self'"]);
    expect(csp.get('script-src-attr')).toEqual(["'none'"]);
    expect(csp.get('style-src')).toEqual(["'self'"]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('frame-ancestors')).toEqual(["'none'"]);
    expect(csp.get('base-uri')).toEqual(["'self'"]);
    for (const [name, values] of csp) {
      expect(values, name).not.toContain("'unsafe-inline'");
      expect(values, name).not.toContain("'unsafe-eval'");
      expect(values, name).not.toContain('https:');
      expect(values, name).not.toContain('*');
    }
  });

  it('sends the usual companions and no HSTS over plain HTTP', async () => {
    const response = await request(ctx.app).get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['x-powered-by']).toBeUndefined();
    expect(response.headers['strict-transport-security']).toBeUndefined();
    expect(response.headers['content-security-policy']).not.toMatch(/upgrade-insecure-requests/);
  });

  it('adds HSTS and upgrade-insecure-requests when PUBLIC_URL is https', async () => {
    const secure = createTestContext({ env: { PUBLIC_URL: 'https://quietlayer.larkspur.example', COOKIE_SECURE: 'true' } });
    try {
      const response = await request(secure.app).get('/api/health');
      expect(response.headers['strict-transport-security']).toMatch(/max-age=\d+/);
      expect(response.headers['content-security-policy']).toMatch(/upgrade-insecure-requests/);
    } finally {
      await secure.close();
    }
  });
});
