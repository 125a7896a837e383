import { createHash, randomBytes } from 'node:crypto';

/** Invitation links stay valid for 7 days, password-reset links for 1 hour. */
export const INVITATION_TTL_MS = 7 * 24 * 3600 * 1000;
export const PASSWORD_RESET_TTL_MS = 3600 * 1000;

/** SHA-256 hex of a token: only this is stored, so a leaked table cannot be replayed as links. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** 32 random bytes, base64url: the secret part of an e-mailed link. */
export function createToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}
