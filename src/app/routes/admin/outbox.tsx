import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { rolesForPath } from '../../../config/navigation';
import { paths } from '../../../config/paths';
import { usePublicConfig } from '../../../features/auth/api/get-public-config';
import { outboxQueryOptions, useOutbox, type OutboxListParams } from '../../../features/outbox/api/get-outbox';
import { OutboxTable } from '../../../features/outbox/components/outbox-table';
import { queryClient } from '../../../lib/query-client';
import { readPage, withParams } from '../../../utils/search-params';
import { RoleGate } from '../../role-gate';
import { hasRole } from '../../route-access';
import { RouteError } from '../route-error';
import { useDocumentTitle } from '../../use-document-title';
import { Button } from '../../../components/ui/button';

const PAGE_SIZE = 25;
const roles = rolesForPath(paths.adminOutbox);

function listParams(search: URLSearchParams): OutboxListParams {
  return { page: readPage(search), pageSize: PAGE_SIZE };
}

export async function loader({ request }: LoaderFunctionArgs) {
  if (await hasRole(request, roles)) {
    await queryClient.ensureQueryData(outboxQueryOptions(listParams(new URL(request.url).searchParams)));
  }
  return null;
}

function OutboxPage() {
  const [search, setSearch] = useSearchParams();
  const params = listParams(search);
  const outbox = useOutbox(params);
  const config = usePublicConfig();

  return (
    <>
      <PageHeader
        title="Outbox"
        lead="Every e-mail QuietLayer has sent or tried to send: invitations, password resets and alerts. Newest first."
        actions={
          <Button variant="secondary" busy={outbox.isFetching && !outbox.isPending} onClick={() => void outbox.refetch()}>
            Refresh
          </Button>
        }
      />
      {config.data?.demoMode && (
        <Notice tone="info" title="Demo mode: mail stays on this machine" className="mb-4">
          Messages go to QuietLayer&apos;s built-in local mail catcher, not to real inboxes. Open a message to read its text and follow its link.
        </Notice>
      )}
      {outbox.isPending ? (
        <Loading label="Loading the outbox…" />
      ) : outbox.isError ? (
        <Notice tone="error" title="Could not load the outbox">
          {outbox.error.message}
        </Notice>
      ) : outbox.data.total === 0 ? (
        <EmptyState title="No e-mail yet">
          Invite someone from the Users page, or ask for a password reset from the sign-in page; the message appears here.
        </EmptyState>
      ) : (
        <>
          <OutboxTable messages={outbox.data.items} busy={outbox.isPlaceholderData} />
          <Pagination
            label="Outbox"
            page={outbox.data.page}
            pageSize={outbox.data.pageSize}
            total={outbox.data.total}
            busy={outbox.isFetching}
            onPageChange={(page) => setSearch(withParams(search, { page }))}
          />
        </>
      )}
    </>
  );
}

export function Component() {
  useDocumentTitle('Outbox');
  return (
    <RoleGate roles={roles} pageName="Outbox">
      <OutboxPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
