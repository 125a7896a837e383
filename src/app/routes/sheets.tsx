import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { sheetStateLabels, sheetStateValues, type SheetState } from '../../../shared/schemas/sheets';
import { Button } from '../../components/ui/button';
import { EmptyState } from '../../components/ui/empty-state';
import { Field, Select } from '../../components/ui/field';
import { Loading } from '../../components/ui/loading';
import { Notice } from '../../components/ui/notice';
import { PageHeader } from '../../components/ui/page-header';
import { Pagination } from '../../components/ui/pagination';
import { SearchBox } from '../../components/ui/search-box';
import { rolesForPath } from '../../config/navigation';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { sheetsQueryOptions, useSheetFilters, useSheets, type SheetListParams } from '../../features/sheets/api/get-sheets';
import { NewSheetForm } from '../../features/sheets/components/new-sheet-form';
import { SheetsTable } from '../../features/sheets/components/sheets-table';
import { queryClient } from '../../lib/query-client';
import { readPage, readText, withParams } from '../../utils/search-params';
import { RoleGate } from '../role-gate';
import { hasRole } from '../route-access';
import { useDocumentTitle } from '../use-document-title';
import { RouteError } from './route-error';

const PAGE_SIZE = 25;
const roles = rolesForPath(paths.sheets);

function listParams(search: URLSearchParams): SheetListParams {
  const state = search.get('state');
  return {
    page: readPage(search),
    pageSize: PAGE_SIZE,
    q: readText(search, 'q'),
    line: readText(search, 'line'),
    authorId: readText(search, 'author'),
    state: (sheetStateValues as readonly string[]).includes(state ?? '') ? (state as SheetState) : undefined,
  };
}

export async function loader({ request }: LoaderFunctionArgs) {
  if (await hasRole(request, roles)) {
    await queryClient.ensureQueryData(sheetsQueryOptions(listParams(new URL(request.url).searchParams))).catch(() => undefined);
  }
  return null;
}

function SheetsPage() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const [search, setSearch] = useSearchParams();
  const params = listParams(search);
  const sheets = useSheets(params);
  const filters = useSheetFilters();
  const creating = me.role === 'engineer' && search.get('new') === '1';
  const filtered = Boolean(params.q || params.line || params.authorId || params.state);

  return (
    <>
      <PageHeader
        title="Process sheets"
        lead="Numbered, signed records of layer checks. Engineers issue and submit them; QA reviewers sign or return them. A signed sheet never changes."
        actions={
          me.role === 'engineer' && !creating ? <Button onClick={() => setSearch(withParams(search, { new: '1' }))}>New sheet from check…</Button> : undefined
        }
      />
      {creating && (
        <div className="mb-6 max-w-2xl">
          <NewSheetForm initialCheckId={readText(search, 'checkId')} onCancel={() => setSearch(withParams(search, { new: undefined, checkId: undefined }))} />
        </div>
      )}
      <section aria-label="Sheet list" className="flex min-w-0 flex-col gap-4">
        <div className="no-print grid gap-3 sm:grid-cols-2 xl:grid-cols-4">
          <SearchBox label="Find by number or title" value={params.q ?? ''} onSearch={(q) => setSearch(withParams(search, { q }))} />
          <Field label="State">
            {({ id }) => (
              <Select id={id} value={params.state ?? ''} onChange={(e) => setSearch(withParams(search, { state: e.target.value || undefined }))}>
                <option value="">Any state</option>
                {sheetStateValues.map((s) => (
                  <option key={s} value={s}>
                    {sheetStateLabels[s]}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Field label="Line">
            {({ id }) => (
              <Select id={id} value={params.line ?? ''} onChange={(e) => setSearch(withParams(search, { line: e.target.value || undefined }))}>
                <option value="">Any line</option>
                {(filters.data?.lines ?? []).map((l) => (
                  <option key={l} value={l}>
                    {l}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Field label="Author">
            {({ id }) => (
              <Select id={id} value={params.authorId ?? ''} onChange={(e) => setSearch(withParams(search, { author: e.target.value || undefined }))}>
                <option value="">Anyone</option>
                {(filters.data?.authors ?? []).map((a) => (
                  <option key={a.id} value={a.id}>
                    {a.name}
                  </option>
                ))}
              </Select>
            )}
          </Field>
        </div>
        {sheets.isPending ? (
          <Loading label="Loading process sheets…" />
        ) : sheets.isError ? (
          <Notice tone="error" title="Could not load process sheets">
            {sheets.error.message}
          </Notice>
        ) : sheets.data.total === 0 ? (
          <EmptyState title={filtered ? 'No sheet matches these filters' : 'No process sheets yet'}>
            {filtered
              ? 'Clear a filter or search for another number.'
              : me.role === 'engineer'
                ? 'Issue the first one with “New sheet from check…”, or from a layer check’s page.'
                : 'A process engineer issues sheets from layer checks; they appear here.'}
          </EmptyState>
        ) : (
          <>
            <SheetsTable sheets={sheets.data.items} busy={sheets.isPlaceholderData} />
            <Pagination
              label="Process sheets"
              page={sheets.data.page}
              pageSize={sheets.data.pageSize}
              total={sheets.data.total}
              busy={sheets.isFetching}
              onPageChange={(page) => setSearch(withParams(search, { page }))}
            />
          </>
        )}
      </section>
    </>
  );
}

export function Component() {
  useDocumentTitle('Process sheets');
  return (
    <RoleGate roles={roles} pageName="Process sheets">
      <SheetsPage />
    </RoleGate>
  );
}

export const ErrorBoundary = RouteError;
