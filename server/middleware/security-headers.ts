import type { RequestHandler } from 'express';
import helmet from 'helmet';
import type { Env } from '../env';

/**
 * The Content-Security-Policy QuietLayer sends with every answer: scripts, styles, fonts, images and
 * fetches come only from the app's own origin; no inline scripts, no inline event handlers, no
 * plugins, no framing.
 *
 * Styles: `style-src 'self'` with no 'unsafe-inline'. The plotting library adds its few global rules
 * through the CSSOM (`sheet.insertRule` on an empty `<style>` it appends), and React and the plotting
 * library set element styles through `element.style`; browsers do not apply style-src to either
 * (W3C 2016, "Content Security Policy Level 3", §6.1.9 style-src: only `<style>` text and `style`
 * attributes parsed from markup are checked). tests/e2e/content-security-policy.test.ts draws a plot under
 * this policy and fails on any reported violation.
 */
export function contentSecurityPolicyDirectives(env: Pick<Env, 'PUBLIC_URL'>): Record<string, string[]> {
  const directives: Record<string, string[]> = {
    'default-src': ["'self'"],
    'base-uri': ["'self'"],
    'script-src': ["'self'"],
    'script-src-attr': ["'none'"],
    'style-src': ["'self'"],
    // data: for the plot's "download as PNG" and small inline SVG icons; blob: for exported files.
    'img-src': ["'self'", 'data:', 'blob:'],
    'font-src': ["'self'"],
    'connect-src': ["'self'"],
    'worker-src': ["'self'"],
    'object-src': ["'none'"],
    'frame-ancestors': ["'none'"],
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
