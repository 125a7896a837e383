/** Pull the token out of the link in a mail body: `…?token=<base64url>`. */
export function tokenFromMailText(text: string, path: '/accept-invitation' | '/reset-password'): string {
  const match = new RegExp(`https?://[^\\s]+${path}\\?token=([A-Za-z0-9_-]+)`).exec(text);
  if (!match) throw new Error(`no ${path} link in mail text:\n${text}`);
  return match[1];
}
