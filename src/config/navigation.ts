import type { Role } from '../../shared/schemas/roles';
import { roleValues } from '../../shared/schemas/roles';
import { paths } from './paths';

export interface NavItem {
  label: string;
  to: string;
  /** Roles that see this item and may open its page. */
  roles: readonly Role[];
}

/**
 * The navigation, by role. Later features add their items here; the same list gates
 * the pages (a person who opens a page by URL without the role sees "not permitted").
 * The server checks the role again on every API call.
 */
export const navigation: readonly NavItem[] = [
  { label: 'Home', to: paths.home, roles: roleValues },
  { label: 'Fluids', to: paths.fluids, roles: roleValues },
  { label: 'Layer checks', to: paths.layerChecks, roles: roleValues },
  { label: 'Batch', to: paths.batch, roles: ['engineer'] },
  { label: 'Drying path', to: paths.dryingPath, roles: roleValues },
  { label: 'Property spread', to: paths.propertySpread, roles: roleValues },
  { label: 'Melt pool flow', to: paths.meltPool, roles: roleValues },
  { label: 'Process sheets', to: paths.sheets, roles: roleValues },
  { label: 'Verify a PDF', to: paths.verify, roles: roleValues },
  { label: 'Gauge log', to: paths.gauge, roles: roleValues },
  { label: 'Users', to: paths.adminUsers, roles: ['administrator'] },
  { label: 'Audit trail', to: paths.adminAudit, roles: ['administrator'] },
  { label: 'Outbox', to: paths.adminOutbox, roles: ['administrator'] },
];

export function navigationFor(role: Role): NavItem[] {
  return navigation.filter((item) => item.roles.includes(role));
}

/** Roles allowed on a page, read from the navigation entry with that path. */
export function rolesForPath(path: string): readonly Role[] {
  const item = navigation.find((entry) => entry.to === path);
  if (!item) throw new Error(`No navigation entry for ${path}`);
  return item.roles;
}
