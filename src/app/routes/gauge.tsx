import { useSearchParams } from 'react-router-dom';
import { EmptyState } from '../../components/ui/empty-state';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { Pagination } from '../../components/ui/pagination';
import { SearchBox } from '../../components/ui/search-box';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { useReleasedChecks } from '../../features/gauge-log/api/gauge-queries';
import { ReleasedChecksTable } from '../../features/gauge-log/components/released-checks-table';
import { readPage, readText, withParams } from '../../utils/search-params';
import { RoleGate } from '../role-gate';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const roles = rolesForPath(paths.gauge);

function GaugePage() {
  const [search, setSearch] = useSearchParams();
  const params = { page: readPage(search), pageSize: 25, q: readText(search, 'q') };
  const released = useReleasedChecks(params);
  return (
    <>
      <PageHeader
        title="Gauge log"
        lead="Thickness readings from the line, judged against the released (signed) process sheet. Open a released check to upload a gauge file, see the verdicts and the chart."
      />
      <div className="mb-4 max-w-md">
        <SearchBox label="Find by sheet number or title" value={params.q ?? ''} onSearch={(q) => setSearch(withParams(search, { q }))} />
      </div>
      {released.isPending ? (
        <Loading label="Loading released checks…" />
      ) : released.isError ? (
        <Notice tone="error" title="Could not load released checks">
          {released.error.message}
        </Notice>
      ) : released.data.total === 0 ? (
        <EmptyState title="No released checks yet">A process sheet must be signed by a QA reviewer before readings can be judged against it.</EmptyState>
      ) : (
        <>
          <ReleasedChecksTable items={released.data.items} />
          <Pagination
            label="Released checks"
            page={released.data.page}
            pageSize={released.data.pageSize}
            total={released.data.total}
            busy={released.isFetching}
            onPageChange={(page) => setSearch(withParams(search, { page }))}
          />
        </>
      )}
    </>
  );
}

export function Component() {
  useDocumentTitle('Gauge log');
  return (
    <RoleGate roles={roles} pageName="Gauge log">
      <GaugePage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
