import { useQueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { useEffect } from 'react';
import { Outlet, useLocation, useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { roleLabels } from '../../../shared/schemas/roles';
import { AppShell } from '../../components/layout/app-shell';
import { UserMenu } from '../../components/layout/user-menu';
import { navigationFor } from '../../config/navigation';
import { paths, signInPath } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { useSignOut } from '../../features/auth/api/sign-out';
import { isApiError } from '../../lib/api-client';
import { requireMe } from '../route-access';

export async function appRootLoader({ request }: LoaderFunctionArgs) {
  await requireMe(request);
  return null;
}

/** The signed-in frame: every page under it has a session (the loader made sure). */
export function AppRoot() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const signOut = useSignOut();
  useRedirectWhenSessionEnds();

  const handleSignOut = () => {
    signOut.mutate(undefined, {
      onSettled: async () => {
        await navigate(paths.signIn, { replace: true });
        queryClient.clear();
      },
    });
  };

  return (
    <AppShell
      navItems={navigationFor(me.role)}
      userMenu={
        <UserMenu displayName={me.displayName} email={me.email} roleLabel={roleLabels[me.role]} onSignOut={handleSignOut} signingOut={signOut.isPending} />
      }
    >
      <Outlet />
    </AppShell>
  );
}

/** When any server call answers 401 (the 8-hour session ended), go to sign-in and come back here after. */
function useRedirectWhenSessionEnds() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const location = useLocation();
  useEffect(() => {
    const onUnauthenticated = (error: unknown) => {
      // Only a missing/expired session ('unauthenticated'); a 401 for a wrong password typed to
      // confirm a signature ('invalid_credentials') belongs to that form, not to a redirect.
      if (isApiError(error) && error.status === 401 && error.code === 'unauthenticated') {
        void navigate(signInPath(location.pathname + location.search), { replace: true });
      }
    };
    const unsubscribeQueries = queryClient.getQueryCache().subscribe((event) => {
      if (event.type === 'updated' && event.action.type === 'error') onUnauthenticated(event.action.error);
    });
    const unsubscribeMutations = queryClient.getMutationCache().subscribe((event) => {
      if (event.type === 'updated' && event.action.type === 'error') onUnauthenticated(event.action.error);
    });
    return () => {
      unsubscribeQueries();
      unsubscribeMutations();
    };
  }, [queryClient, navigate, location.pathname, location.search]);
}
