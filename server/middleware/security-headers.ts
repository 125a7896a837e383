import type { RequestHandler } from 'express';
import { createHash } from 'node:crypto';
import helmet from 'helmet';
import type { Env } from '../env';

/**
 * The Content-Security-Policy QuietLayer sends with every answer: scripts, styles, fonts, images and
 * fetches come only from the app's own origin; no inline scripts, no eval, no inline event handlers,
 * no plugins, no framing by other sites.
 *
 * Styles: `style-src 'self'` plus two hashes, never 'unsafe-inline' (W3C, "Content Security Policy
 * Level 3", §8.3 hash-source matching on the element's text):
 *   - the hash of the empty string: the plotting library appends an EMPTY `<style>` and then adds its
 *     rules through the CSSOM (`sheet.insertRule`), which style-src does not govern. An empty style
 *     element carries no styles, so allowing exactly that costs nothing;
 *   - the hash of the fixed map stylesheet the plotting bundle injects when it loads (its map module;
 *     QuietLayer draws no maps, but the bundle adds it anyway). Only that exact text is allowed.
 * React and the plotting library set most element styles through `element.style` (CSSOM), also
 * outside style-src. The one exception: the plotting library styles rich-text tags in titles and labels
 * (<sup>, <sub>, <b>, <i>, …) with `setAttribute('style', …)` using a fixed table of declarations.
 * `style-src-attr 'unsafe-hashes'` with the hashes of exactly those declarations allows them and no
 * other style attribute (CSP Level 3, §6.1.11 style-src-attr and the 'unsafe-hashes' keyword). The client turns off zod's eval probe (`z.config({ jitless: true })` in src/main.tsx).
 * tests/hardening/browser-xss-csp.test.ts draws plots under this policy and fails on any violation;
 * after upgrading the plotting library, a changed map stylesheet shows up there as a violation.
 */
const sha256Source = (text: string) => `'sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}'`;

/**
 * The plotting library's fixed rich-text tag styles (plotly.js src/lib/svg_text_utils.js, TAG_STYLES):
 * sup/sub, s, u, b, i, a, em.
 */
export const PLOT_TEXT_TAG_STYLES = [
  'font-size:70%',
  'text-decoration:line-through',
  'text-decoration:underline',
  'font-weight:bold',
  'font-style:italic',
  'cursor:pointer',
  'font-style:italic;font-weight:bold',
] as const;

/** sha256 of "" (base64). */
export const EMPTY_STYLE_HASH = "'sha256-47DEQpj8HBSa+/TImW+5JCeuQeRkm5NMpJWZG3hSuFU='";
/** sha256 of the map stylesheet text in plotly.js-dist-min 4.1.x (".maplibregl-map{…", 83,310 characters). */
export const PLOT_MAP_STYLE_HASH = "'sha256-2GF9hCGTDj/GGFNlQA54jDdMGl2fvoeZmZjAvBSiAtM='";

export function contentSecurityPolicyDirectives(env: Pick<Env, 'PUBLIC_URL'>): Record<string, string[]> {
  const directives: Record<string, string[]> = {
    'default-src': ["'self'"],
    'base-uri': ["'self'"],
    'script-src': ["'self'"],
    'script-src-attr': ["'none'"],
    'style-src': ["'self'", EMPTY_STYLE_HASH, PLOT_MAP_STYLE_HASH],
    // The empty declaration too: the plot's colour bar writes style="" on its elements.
    'style-src-attr': ["'unsafe-hashes'", EMPTY_STYLE_HASH, ...PLOT_TEXT_TAG_STYLES.map(sha256Source)],
    // data: for the plot's "download as PNG" and small inline SVG icons; blob: for exported files.
    'img-src': ["'self'", 'data:', 'blob:'],
    'font-src': ["'self'"],
    'connect-src': ["'self'"],
    'worker-src': ["'self'"],
    'object-src': ["'none'"],
    // The sheet page shows its PDF in a frame of the app's own origin; no other site may frame the app.
    'frame-ancestors': ["'self'"],
    'form-action': ["'self'"],
  };
  // Only meaningful (and only harmless) when the app itself is served over HTTPS.
  if (env.PUBLIC_URL.startsWith('https://')) directives['upgrade-insecure-requests'] = [];
  return directives;
}

/** helmet with QuietLayer's Content-Security-Policy; HSTS only when PUBLIC_URL is https. */
export function securityHeaders(env: Pick<Env, 'PUBLIC_URL'>): RequestHandler {
  return helmet({
    contentSecurityPolicy: { useDefaults: false, directives: contentSecurityPolicyDirectives(env) },
    strictTransportSecurity: env.PUBLIC_URL.startsWith('https://') ? { maxAge: 180 * 24 * 3600 } : false,
    referrerPolicy: { policy: 'same-origin' },
  });
}
