/**
 * After sign-in the person returns to the page they asked for, but only within this site:
 * an absolute or protocol-relative `next` would be an open redirect (OWASP Cheat Sheet Series,
 * "Unvalidated Redirects and Forwards Cheat Sheet").
 */
import { describe, expect, it } from 'vitest';
import { safeNextPath, signInPath } from './paths';

describe('safeNextPath', () => {
  it('keeps a same-site path with its query', () => {
    expect(safeNextPath('/admin/audit?actor=admin')).toBe('/admin/audit?actor=admin');
  });

  it.each(['https://elsewhere.example/', '//elsewhere.example/x', '/\\elsewhere.example', 'javascript:alert(1)', '', null, undefined])(
    'sends %s to Home instead',
    (next) => {
      expect(safeNextPath(next)).toBe('/');
    },
  );

  it('does not loop back to the sign-in page', () => {
    expect(safeNextPath('/sign-in?next=/x')).toBe('/');
  });
});

describe('signInPath', () => {
  it('carries the page to return to, encoded', () => {
    expect(signInPath('/admin/users?q=ann lee')).toBe('/sign-in?next=%2Fadmin%2Fusers%3Fq%3Dann%20lee');
  });

  it('is plain /sign-in when the target is Home', () => {
    expect(signInPath('/')).toBe('/sign-in');
  });
});
