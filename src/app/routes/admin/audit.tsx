import { useMemo } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { rolesForPath } from '../../../config/navigation';
import { paths } from '../../../config/paths';
import { auditQueryOptions, useAudit, type AuditListParams } from '../../../features/audit/api/get-audit';
import type { AuditFilterForm } from '../../../features/audit/components/audit-filter-schema';
import { AuditFilters } from '../../../features/audit/components/audit-filters';
import { AuditTable } from '../../../features/audit/components/audit-table';
import { isApiError } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';
import { readPage, readText, withParams } from '../../../utils/search-params';
import { RoleGate } from '../../role-gate';
import { hasRole } from '../../route-access';
import { RouteError } from '../route-error';
import { useDocumentTitle } from '../../use-document-title';

const PAGE_SIZE = 50;
const roles = rolesForPath(paths.adminAudit);

function listParams(search: URLSearchParams): AuditListParams {
  return {
    page: readPage(search),
    pageSize: PAGE_SIZE,
    actor: readText(search, 'actor'),
    entityType: readText(search, 'entityType'),
    from: readText(search, 'from'),
    to: readText(search, 'to'),
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  if (await hasRole(request, roles)) {
    // A bad filter in a typed URL is shown beside its field by the page, not as a page error.
    await queryClient.prefetchQuery(auditQueryOptions(listParams(new URL(request.url).searchParams)));
  }
  return null;
}

function AuditPage() {
  const [search, setSearch] = useSearchParams();
  const params = listParams(search);
  const audit = useAudit(params);
  const filters: AuditFilterForm = useMemo(
    () => ({ actor: params.actor ?? '', entityType: params.entityType ?? '', from: params.from ?? '', to: params.to ?? '' }),
    [params.actor, params.entityType, params.from, params.to],
  );
  const entityTypes = useMemo(() => [...new Set((audit.data?.items ?? []).map((event) => event.entityType))].sort(), [audit.data]);
  const filtered = Boolean(params.actor || params.entityType || params.from || params.to);
  const serverFieldErrors = isApiError(audit.error) ? audit.error.fields : undefined;

  return (
    <>
      <PageHeader title="Audit trail" lead="Every change and signature, newest first. Entries are permanent: the database refuses edits and deletions." />
      <AuditFilters value={filters} entityTypes={entityTypes} serverFieldErrors={serverFieldErrors} onApply={(next) => setSearch(withParams(search, next))} />
      {audit.isPending ? (
        <Loading label="Loading the audit trail…" />
      ) : audit.isError ? (
        <Notice tone="error" title="Could not load the audit trail">
          {audit.error.message}
        </Notice>
      ) : audit.data.total === 0 ? (
        <EmptyState title={filtered ? 'No events match these filters' : 'No events recorded yet'}>
          {filtered ? 'Widen the date range or clear a filter.' : 'Events appear here as soon as someone signs in, invites a user or changes a record.'}
        </EmptyState>
      ) : (
        <>
          <AuditTable events={audit.data.items} busy={audit.isPlaceholderData} />
          <Pagination
            label="Audit trail"
            page={audit.data.page}
            pageSize={audit.data.pageSize}
            total={audit.data.total}
            busy={audit.isFetching}
            onPageChange={(page) => setSearch(withParams(search, { page }))}
          />
        </>
      )}
    </>
  );
}

export function Component() {
  useDocumentTitle('Audit trail');
  return (
    <RoleGate roles={roles} pageName="Audit trail">
      <AuditPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
