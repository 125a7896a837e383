import { useSuspenseQuery } from '@tanstack/react-query';
import type { SortingState } from '@tanstack/react-table';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { fluidKindLabels, fluidKindValues, type FluidKind } from '../../../shared/schemas/fluids';
import { FilterCheckbox, FilterSelect } from '../../components/ui/list-filters';
import { PageHeader } from '../../components/ui/page-header';
import { PagedList } from '../../components/ui/paged-list';
import { SearchBox } from '../../components/ui/search-box';
import { UnitSystemSelect } from '../../components/units/unit-system-select';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { fluidsQueryOptions, useFluids, type FluidListParams } from '../../features/fluids/api/get-fluids';
import { fluidsCsvExportUrl } from '../../features/fluids/api/import-fluids';
import { FluidImport } from '../../features/fluids/components/fluid-import';
import { FluidsTable } from '../../features/fluids/components/fluids-table';
import { queryClient } from '../../lib/query-client';
import { useUnitSystem } from '../../lib/unit-system';
import { readPage, readText, withParams } from '../../utils/search-params';
import { RoleGate } from '../role-gate';
import { hasRole } from '../route-access';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const PAGE_SIZE = 25;
const roles = rolesForPath(paths.fluids);
const sortable = ['name', 'kind', 'updatedAt', 'density', 'viscosity', 'surfaceTension'] as const;

function listParams(search: URLSearchParams): FluidListParams {
  const kind = search.get('kind');
  const sort = search.get('sort');
  return {
    page: readPage(search),
    pageSize: PAGE_SIZE,
    q: readText(search, 'q'),
    kind: (fluidKindValues as readonly string[]).includes(kind ?? '') ? (kind as FluidKind) : undefined,
    includeArchived: search.get('archived') === 'shown' || undefined,
    sort: (sortable as readonly string[]).includes(sort ?? '') ? (sort as FluidListParams['sort']) : 'name',
    dir: search.get('dir') === 'desc' ? 'desc' : 'asc',
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  if (await hasRole(request, roles)) await queryClient.ensureQueryData(fluidsQueryOptions(listParams(new URL(request.url).searchParams)));
  return null;
}

const linkButton = 'inline-flex min-h-11 items-center justify-center rounded-md border px-4 text-[0.95rem] font-medium';

function FluidsPage() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [system] = useUnitSystem();
  const [search, setSearch] = useSearchParams();
  const params = listParams(search);
  const fluids = useFluids(params);
  const canWrite = me.role === 'engineer';
  const sorting: SortingState = [{ id: params.sort ?? 'name', desc: params.dir === 'desc' }];
  const filtered = Boolean(params.q || params.kind);

  return (
    <>
      <PageHeader
        title="Fluids"
        lead="The fluid library: each property with its temperature law, source and uncertainty. Checks read their properties from here."
        actions={
          <>
            <a href={fluidsCsvExportUrl} download className={`${linkButton} border-slate-line bg-paper-raised text-ink hover:border-brand`}>
              Download CSV
            </a>
            {canWrite && (
              <Link to={`${paths.fluids}/new`} className={`${linkButton} border-brand bg-brand text-white hover:bg-brand-dark`}>
                New fluid
              </Link>
            )}
          </>
        }
      />
      <div className="flex flex-col gap-8">
        <section aria-label="Fluid list" className="flex min-w-0 flex-col gap-4">
          <div className="no-print flex flex-wrap items-end gap-4">
            <div className="min-w-64 flex-1">
              <SearchBox label="Find by name" value={params.q ?? ''} onSearch={(q) => setSearch(withParams(search, { q }))} />
            </div>
            <FilterSelect
              label="Kind"
              value={params.kind ?? ''}
              allLabel="All kinds"
              values={fluidKindValues}
              labels={fluidKindLabels}
              onChange={(kind) => setSearch(withParams(search, { kind }))}
            />
            <FilterCheckbox label="Show archived" checked={Boolean(params.includeArchived)} onChange={(shown) => setSearch(withParams(search, { archived: shown ? 'shown' : undefined }))} />
            <UnitSystemSelect />
          </div>
          <PagedList
            query={fluids}
            noun="fluids"
            label="Fluids"
            emptyTitle={filtered ? 'No fluid matches these filters' : 'The library is empty'}
            emptyText={filtered ? 'Clear the search or the kind filter.' : canWrite ? 'Add a fluid with “New fluid”, or import a CSV file.' : 'A Process engineer adds fluids to the library.'}
            search={search}
            onSearchChange={setSearch}
          >
            {(items, table) => <FluidsTable fluids={items} system={system} sorting={sorting} {...table} />}
          </PagedList>
        </section>
        {canWrite && (
          <aside className="no-print max-w-3xl">
            <FluidImport />
          </aside>
        )}
      </div>
    </>
  );
}

export function Component() {
  useDocumentTitle('Fluids');
  return (
    <RoleGate roles={roles} pageName="Fluids">
      <FluidsPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
