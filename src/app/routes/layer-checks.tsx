import { useSuspenseQuery } from '@tanstack/react-query';
import type { SortingState } from '@tanstack/react-table';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { processKindLabels, processKindValues, type ProcessKind } from '../../../shared/schemas/layer-checks';
import { FilterCheckbox, FilterSelect } from '../../components/ui/list-filters';
import { PageHeader } from '../../components/ui/page-header';
import { PagedList } from '../../components/ui/paged-list';
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
          <FilterSelect
            label="Process kind"
            value={params.processKind ?? ''}
            allLabel="All kinds"
            values={processKindValues}
            labels={processKindLabels}
            onChange={(kind) => setSearch(withParams(search, { kind }))}
          />
          <FilterCheckbox label="Only my checks" checked={Boolean(params.ownerId)} onChange={(mine) => setSearch(withParams(search, { owner: mine ? 'me' : undefined }))} />
          <UnitSystemSelect />
        </div>
        <PagedList
          query={checks}
          noun="layer checks"
          label="Layer checks"
          emptyTitle={filtered ? 'No check matches these filters' : 'No layer checks yet'}
          emptyText={filtered ? 'Clear the search, the process-kind filter or “Only my checks”.' : canWrite ? 'Start one with “New layer check”.' : 'A Process engineer sets up the checks; they appear here.'}
          search={search}
          onSearchChange={setSearch}
        >
          {(items, table) => <LayerChecksTable checks={items} system={system} sorting={sorting} {...table} />}
        </PagedList>
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
