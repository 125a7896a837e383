/**
 * Response headers: a Content-Security-Policy that allows only the app's own scripts and styles
 * (W3C, "Content Security Policy Level 3"), no inline script, no framing; HSTS only over HTTPS
 * (RFC 6797 §7.2: a host must not send it over plain HTTP).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { EMPTY_STYLE_HASH, PLOT_MAP_STYLE_HASH, PLOT_TEXT_TAG_STYLES } from '../../server/middleware/security-headers';
import { createTestContext, type TestContext } from '../integration/helpers/test-app';

const sha256 = (text: string) => `'sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}'`;

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
    expect(csp.get('style-src')).toEqual(["'self'", EMPTY_STYLE_HASH, PLOT_MAP_STYLE_HASH]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('frame-ancestors')).toEqual(["'self'"]);
    expect(csp.get('base-uri')).toEqual(["'self'"]);
    for (const [name, values] of csp) {
      expect(values, name).not.toContain("'unsafe-inline'");
      expect(values, name).not.toContain("'unsafe-eval'");
      expect(values, name).not.toContain('https:');
      expect(values, name).not.toContain('*');
    }
  });

  it('allows by hash only an empty style element and the plotting bundle’s own map stylesheet, as installed', () => {
    expect(EMPTY_STYLE_HASH).toBe(sha256(''));
    // The exact stylesheet text the installed plotting bundle injects (element.textContent = '…').
    const bundle = readFileSync(createRequire(import.meta.url).resolve('plotly.js-dist-min'), 'utf8');
    const literal = /textContent='(\.maplibregl-map\{[^']*)'/.exec(bundle);
    expect(literal).not.toBeNull();
    expect(PLOT_MAP_STYLE_HASH).toBe(sha256(literal![1]));
  });

  it('allows style attributes only with the plotting library’s fixed rich-text declarations and the empty one, by hash', async () => {
    const response = await request(ctx.app).get('/api/health');
    const attr = directives(response.headers['content-security-policy']).get('style-src-attr');
    // The empty declaration: the colour bar of a heat map writes style="" (seen as a violation on the check page).
    expect(attr).toEqual(["'unsafe-hashes'", sha256(''), ...PLOT_TEXT_TAG_STYLES.map(sha256)]);
    // The same declarations as the installed bundle's tag table ({sup:"font-size:70%",sub:…}).
    const bundle = readFileSync(createRequire(import.meta.url).resolve('plotly.js-dist-min'), 'utf8');
    const table = /\{sup:"font-size:70%"[^}]*\}/.exec(bundle);
    expect(table).not.toBeNull();
    const declared = new Set([...table![0].matchAll(/:"([^"]*)"/g)].map((m) => m[1]).filter(Boolean));
    expect(new Set(PLOT_TEXT_TAG_STYLES)).toEqual(declared);
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
