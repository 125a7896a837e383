import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { SearchBox } from '../../../components/ui/search-box';
import { rolesForPath } from '../../../config/navigation';
import { paths } from '../../../config/paths';
import { meQueryOptions } from '../../../features/auth/api/get-me';
import { usersQueryOptions, useUsers, type UserListParams } from '../../../features/users/api/get-users';
import { InviteUserForm } from '../../../features/users/components/invite-user-form';
import { UsersTable } from '../../../features/users/components/users-table';
import { queryClient } from '../../../lib/query-client';
import { readPage, readText, withParams } from '../../../utils/search-params';
import { RoleGate } from '../../role-gate';
import { hasRole } from '../../route-access';
import { RouteError } from '../route-error';
import { useDocumentTitle } from '../../use-document-title';

const PAGE_SIZE = 25;
const roles = rolesForPath(paths.adminUsers);

function listParams(search: URLSearchParams): UserListParams {
  return { page: readPage(search), pageSize: PAGE_SIZE, q: readText(search, 'q') };
}

export async function loader({ request }: LoaderFunctionArgs) {
  if (await hasRole(request, roles)) {
    await queryClient.ensureQueryData(usersQueryOptions(listParams(new URL(request.url).searchParams)));
  }
  return null;
}

function UsersPage() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [search, setSearch] = useSearchParams();
  const params = listParams(search);
  const users = useUsers(params);

  return (
    <>
      <PageHeader title="Users" lead="Everyone who can sign in to this site, their role and whether their account is active." />
      <div className="grid grid-cols-1 gap-6 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <section aria-label="User list" className="flex min-w-0 flex-col gap-4">
          <SearchBox label="Find by name or e-mail" value={params.q ?? ''} onSearch={(q) => setSearch(withParams(search, { q }))} />
          {users.isPending ? (
            <Loading label="Loading users…" />
          ) : users.isError ? (
            <Notice tone="error" title="Could not load users">
              {users.error.message}
            </Notice>
          ) : users.data.total === 0 ? (
            <EmptyState title={params.q ? `No user matches “${params.q}”` : 'No users yet'}>
              {params.q ? 'Check the spelling, clear the search, or invite the person with the form.' : 'Invite the first colleague with the form beside this list.'}
            </EmptyState>
          ) : (
            <>
              <UsersTable users={users.data.items} currentUserId={me.id} busy={users.isPlaceholderData} />
              <Pagination
                label="Users"
                page={users.data.page}
                pageSize={users.data.pageSize}
                total={users.data.total}
                busy={users.isFetching}
                onPageChange={(page) => setSearch(withParams(search, { page }))}
              />
            </>
          )}
        </section>
        <aside className="no-print">
          <InviteUserForm />
        </aside>
      </div>
    </>
  );
}

export function Component() {
  useDocumentTitle('Users');
  return (
    <RoleGate roles={roles} pageName="Users">
      <UsersPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
