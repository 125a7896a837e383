import { useSuspenseQuery } from '@tanstack/react-query';
import type { SortingState } from '@tanstack/react-table';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { processKindLabels, processKindValues, type ProcessKind } from '../../../shared/schemas/layer-checks';
import { EmptyState } from '../../components/ui/empty-state';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { Pagination } from '../../components/ui/pagination';
import { SearchBox } from '../../components/ui/search-box';
import { UnitSystemSelect } from '../../components/units/unit-system-select';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { layerChecksQueryOptions, useLayerChecks, type LayerCheckListParams } from '../../features/layer-checks/api/get-layer-checks';
import { LayerChecksTable } from '../../features/layer-checks/components/layer-checks-table';
import { queryClient } from '../../lib/query-client';
import { useUnitSystem } from '../../lib/unit-system';
import { readPage, readText, withParams } from '../../utils/search-params';
import { RoleGate } from '../role-gate';
import { requireMe } from '../route-access';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const PAGE_SIZE = 25;
const roles = rolesForPath(paths.layerChecks);
const sortable = ['title', 'processKind', 'updatedAt', 'depth', 'margin'] as const;

/** `owner=me` in the URL keeps "Only my checks" across reloads and shared links; the API gets the id. */
function listParams(search: URLSearchParams, meId: string): LayerCheckListParams {
  const kind = search.get('kind');
  const sort = search.get('sort');
  return {
    page: readPage(search),
    pageSize: PAGE_SIZE,
    q: readText(search, 'q'),
    processKind: (processKindValues as readonly string[]).includes(kind ?? '') ? (kind as ProcessKind) : undefined,
    ownerId: search.get('owner') === 'me' ? meId : undefined,
    sort: (sortable as readonly string[]).includes(sort ?? '') ? (sort as LayerCheckListParams['sort']) : 'updatedAt',
    dir: search.get('dir') === 'asc' ? 'asc' : 'desc',
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  const me = await requireMe(request);
  if (!roles.includes(me.role)) return null;
  await queryClient.ensureQueryData(layerChecksQueryOptions(listParams(new URL(request.url).searchParams, me.id)));
  return null;
}

function LayerChecksPage() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [system] = useUnitSystem();
  const [search, setSearch] = useSearchParams();
  const params = listParams(search, me.id);
  const checks = useLayerChecks(params);
  const canWrite = me.role === 'engineer';
  const sorting: SortingState = [{ id: params.sort ?? 'updatedAt', desc: params.dir === 'desc' }];
  const filtered = Boolean(params.q || params.processKind || params.ownerId);

  return (
    <>
      <PageHeader
        title="Layer checks"
        lead="Each check is one layer on one line: the fluid, the depth, the boundaries and how it is heated, with the margin it had when it was saved."
        actions={
          canWrite && (
            <Link to={`${paths.layerChecks}/new`} className="inline-flex min-h-11 items-center rounded-md border border-brand bg-brand px-4 font-medium text-white hover:bg-brand-dark">
              New layer check
            </Link>
          )
        }
      />
      <div className="flex flex-col gap-4">
        <div className="no-print flex flex-wrap items-end gap-4">
          <div className="min-w-64 flex-1">
            <SearchBox label="Find by title" value={params.q ?? ''} onSearch={(q) => setSearch(withParams(search, { q }))} />
          </div>
          <label className="flex flex-col gap-1 text-sm font-semibold">
            Process kind
            <select
              value={params.processKind ?? ''}
              onChange={(event) => setSearch(withParams(search, { kind: event.target.value }))}
              className="min-h-11 rounded-md border border-slate-line bg-paper-raised px-2 font-normal"
            >
              <option value="">All kinds</option>
              {processKindValues.map((kind) => (
                <option key={kind} value={kind}>
                  {processKindLabels[kind]}
                </option>
              ))}
            </select>
          </label>
          <label className="flex min-h-11 items-center gap-2 text-sm">
            <input
              type="checkbox"
              className="size-5"
              checked={Boolean(params.ownerId)}
              onChange={(event) => setSearch(withParams(search, { owner: event.target.checked ? 'me' : undefined }))}
            />
            Only my checks
          </label>
          <UnitSystemSelect />
        </div>
        {checks.isPending ? (
          <Loading label="Loading layer checks…" />
        ) : checks.isError ? (
          <Notice tone="error" title="Could not load the layer checks">
            {checks.error.message}
          </Notice>
        ) : checks.data.total === 0 ? (
          <EmptyState title={filtered ? 'No check matches these filters' : 'No layer checks yet'}>
            {filtered ? 'Clear the search, the process-kind filter or “Only my checks”.' : canWrite ? 'Start one with “New layer check”.' : 'A Process engineer sets up the checks; they appear here.'}
          </EmptyState>
        ) : (
          <>
            <LayerChecksTable
              checks={checks.data.items}
              system={system}
              sorting={sorting}
              busy={checks.isPlaceholderData}
              onSortingChange={(next) => {
                const first = next[0];
                setSearch(withParams(search, { sort: first?.id, dir: first?.desc ? 'desc' : 'asc' }));
              }}
            />
            <Pagination
              label="Layer checks"
              page={checks.data.page}
              pageSize={checks.data.pageSize}
              total={checks.data.total}
              busy={checks.isFetching}
              onPageChange={(page) => setSearch(withParams(search, { page }))}
            />
          </>
        )}
      </div>
    </>
  );
}

export function Component() {
  useDocumentTitle('Layer checks');
  return (
    <RoleGate roles={roles} pageName="Layer checks">
      <LayerChecksPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
