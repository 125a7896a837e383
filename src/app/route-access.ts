import { redirect } from 'react-router-dom';
import type { Me } from '../../shared/schemas/auth';
import type { Role } from '../../shared/schemas/roles';
import { signInPath } from '../config/paths';
import { meQueryOptions } from '../features/auth/api/get-me';
import { isApiError } from '../lib/api-client';
import { queryClient } from '../lib/query-client';

/** Loads the signed-in person for a loader; no session → redirect to sign-in, returning here afterwards. */
export async function requireMe(request: Request): Promise<Me> {
  try {
    return await queryClient.ensureQueryData(meQueryOptions());
  } catch (error) {
    if (isApiError(error) && error.status === 401) {
      const url = new URL(request.url);
      throw redirect(signInPath(url.pathname + url.search));
    }
    throw error;
  }
}

/** True when the signed-in person's role may open a page; loaders skip data fetching when false. */
export async function hasRole(request: Request, roles: readonly Role[]): Promise<boolean> {
  const me = await requireMe(request);
  return roles.includes(me.role);
}
