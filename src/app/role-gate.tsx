import { useSuspenseQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import type { Role } from '../../shared/schemas/roles';
import { roleLabels } from '../../shared/schemas/roles';
import { NotPermitted } from '../components/ui/not-permitted';
import { meQueryOptions } from '../features/auth/api/get-me';

/** Renders the page only for the roles given; others see a clear "not permitted" state. */
export function RoleGate({ roles, pageName, children }: { roles: readonly Role[]; pageName: string; children: ReactNode }) {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  if (!roles.includes(me.role)) return <NotPermitted roleLabel={roleLabels[me.role]} pageName={pageName} />;
  return <>{children}</>;
}
