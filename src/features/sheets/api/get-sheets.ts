import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { sheetFiltersSchema, sheetListSchema, type SheetState } from '../../../../shared/schemas/sheets';
import { api } from '../../../lib/api-client';

export interface SheetListParams {
  page: number;
  pageSize: number;
  state?: SheetState;
  line?: string;
  authorId?: string;
  q?: string;
}

export const sheetsQueryOptions = (params: SheetListParams) =>
  queryOptions({
    queryKey: ['sheets', 'list', params],
    queryFn: ({ signal }) => api.get('/sheets', { ...params }, { schema: sheetListSchema, signal }),
    placeholderData: keepPreviousData,
  });

export const useSheets = (params: SheetListParams) => useQuery(sheetsQueryOptions(params));

export const sheetFiltersQueryOptions = () =>
  queryOptions({
    queryKey: ['sheets', 'filters'],
    queryFn: ({ signal }) => api.get('/sheets/filters', undefined, { schema: sheetFiltersSchema, signal }),
  });

export const useSheetFilters = () => useQuery(sheetFiltersQueryOptions());
