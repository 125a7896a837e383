/** Every client URL in one place, so links and redirects cannot drift apart. */
export const paths = {
  home: '/',
  signIn: '/sign-in',
  forgotPassword: '/forgot-password',
  resetPassword: '/reset-password',
  acceptInvitation: '/accept-invitation',
  adminUsers: '/admin/users',
  adminOutbox: '/admin/outbox',
  adminAudit: '/admin/audit',
  fluids: '/fluids',
  layerChecks: '/layer-checks',
  batch: '/batch',
  dryingPath: '/drying-path',
  propertySpread: '/property-spread',
  meltPool: '/melt-pool',
  sheets: '/sheets',
  verify: '/verify',
  gauge: '/gauge',
} as const;

/** The sign-in URL that returns to `next` afterwards. */
export function signInPath(next?: string): string {
  const target = next ? safeNextPath(next) : paths.home;
  return target === paths.home ? paths.signIn : `${paths.signIn}?next=${encodeURIComponent(target)}`;
}

/**
 * Only same-site paths may be a redirect target after sign-in ("/x", never "//host" or "https://…"),
 * so a crafted link cannot send a person elsewhere.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return paths.home;
  if (next.startsWith(paths.signIn)) return paths.home;
  return next;
}
