import type { UseQueryResult } from '@tanstack/react-query';
import type { SortingState } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { withParams } from '../../utils/search-params';
import { EmptyState } from './empty-state';
import { Loading } from './loading';
import { Notice } from './notice';
import { Pagination } from './pagination';

interface ListPage<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

interface PagedListProps<T> {
  query: UseQueryResult<ListPage<T>>;
  /** What the list holds, lower case and plural: "Loading fluids…", "Could not load the fluids". */
  noun: string;
  /** Names the pager ("Fluids pages"). */
  label: string;
  /** Shown when the server has nothing to list. */
  emptyTitle: string;
  emptyText: ReactNode;
  /** The page's URL search params, where `page`, `sort` and `dir` live beside the filters. */
  search: URLSearchParams;
  onSearchChange: (next: URLSearchParams) => void;
  /** The table for one page: `busy` while the previous page is still shown; a new sorting goes to the URL. */
  children: (items: T[], table: { busy: boolean; onSortingChange: (sorting: SortingState) => void }) => ReactNode;
}

/**
 * One list that the server pages and sorts: loading, error and empty states, then the page's table
 * and the pager. Paging and sorting change the URL, and the page's query follows it.
 */
export function PagedList<T>({ query, noun, label, emptyTitle, emptyText, search, onSearchChange, children }: PagedListProps<T>) {
  if (query.isPending) return <Loading label={`Loading ${noun}…`} />;
  if (query.isError) {
    return (
      <Notice tone="error" title={`Could not load the ${noun}`}>
        {query.error.message}
      </Notice>
    );
  }
  if (query.data.total === 0) return <EmptyState title={emptyTitle}>{emptyText}</EmptyState>;
  return (
    <>
      {children(query.data.items, {
        busy: query.isPlaceholderData,
        onSortingChange: (next) => onSearchChange(withParams(search, { sort: next[0]?.id, dir: next[0]?.desc ? 'desc' : 'asc' })),
      })}
      <Pagination
        label={label}
        page={query.data.page}
        pageSize={query.data.pageSize}
        total={query.data.total}
        busy={query.isFetching}
        onPageChange={(page) => onSearchChange(withParams(search, { page }))}
      />
    </>
  );
}
