import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import {
  batchListSchema,
  gaugeNoteListSchema,
  gaugeTokenListSchema,
  gaugeWindowSchema,
  readingListSchema,
  readingSeriesSchema,
  releasedCheckListSchema,
  runSummaryListSchema,
  spotsSchema,
  type GaugeFlag,
  type NoteState,
} from '../../../../shared/schemas/gauge-log';
import { api } from '../../../lib/api-client';

const base = (revisionId: string) => `/gauge/released/${encodeURIComponent(revisionId)}`;

export const releasedChecksQueryOptions = (params: { page: number; pageSize: number; q?: string }) =>
  queryOptions({
    queryKey: ['gauge', 'released', params],
    queryFn: ({ signal }) => api.get('/gauge/released', { ...params }, { schema: releasedCheckListSchema, signal }),
    placeholderData: keepPreviousData,
  });
export const useReleasedChecks = (params: { page: number; pageSize: number; q?: string }) => useQuery(releasedChecksQueryOptions(params));

export const gaugeWindowQueryOptions = (revisionId: string) =>
  queryOptions({
    queryKey: ['gauge', 'window', revisionId],
    queryFn: ({ signal }) => api.get(base(revisionId), undefined, { schema: gaugeWindowSchema, signal }),
  });
export const useGaugeWindow = (revisionId: string) => useQuery(gaugeWindowQueryOptions(revisionId));

export interface ReadingParams {
  page: number;
  pageSize: number;
  flag?: GaugeFlag;
  run?: string;
}
export const readingsQueryOptions = (revisionId: string, params: ReadingParams) =>
  queryOptions({
    queryKey: ['gauge', 'readings', revisionId, params],
    queryFn: ({ signal }) => api.get(`${base(revisionId)}/readings`, { ...params }, { schema: readingListSchema, signal }),
    placeholderData: keepPreviousData,
  });
export const useReadings = (revisionId: string, params: ReadingParams) => useQuery(readingsQueryOptions(revisionId, params));

export const useReadingSeries = (revisionId: string, run?: string) =>
  useQuery({
    queryKey: ['gauge', 'series', revisionId, run ?? null],
    queryFn: ({ signal }) => api.get(`${base(revisionId)}/series`, { run }, { schema: readingSeriesSchema, signal }),
    placeholderData: keepPreviousData,
  });

export const useRunSummaries = (revisionId: string) =>
  useQuery({
    queryKey: ['gauge', 'runs', revisionId],
    queryFn: ({ signal }) => api.get(`${base(revisionId)}/runs`, undefined, { schema: runSummaryListSchema, signal }),
  });

export const useBatches = (revisionId: string) =>
  useQuery({
    queryKey: ['gauge', 'batches', revisionId],
    queryFn: ({ signal }) => api.get(`${base(revisionId)}/batches`, { pageSize: 10 }, { schema: batchListSchema, signal }),
  });

export interface SpotParams {
  run: string;
  direction?: 'md' | 'cd';
  readingsPerSpot?: number;
  specMin?: string;
  specMax?: string;
}
export const useSpots = (revisionId: string, params: SpotParams | null) =>
  useQuery({
    queryKey: ['gauge', 'spots', revisionId, params],
    queryFn: ({ signal }) => api.get(`${base(revisionId)}/spots`, { ...(params as SpotParams) }, { schema: spotsSchema, signal }),
    enabled: params !== null && params.run !== '',
    placeholderData: keepPreviousData,
  });

export const useGaugeNotes = (params: { revisionId?: string; state?: NoteState; page?: number }) =>
  useQuery({
    queryKey: ['gauge', 'notes', params],
    queryFn: ({ signal }) => api.get('/gauge/notes', { pageSize: 50, ...params }, { schema: gaugeNoteListSchema, signal }),
  });

export const useGaugeTokens = (revisionId: string, enabled: boolean) =>
  useQuery({
    queryKey: ['gauge', 'tokens', revisionId],
    queryFn: ({ signal }) => api.get('/gauge/tokens', { revisionId }, { schema: gaugeTokenListSchema, signal }),
    enabled,
  });

/** Where the browser downloads the judged readings as CSV. */
export function exportUrl(revisionId: string, filter: { run?: string; flag?: GaugeFlag }): string {
  const search = new URLSearchParams();
  if (filter.run) search.set('run', filter.run);
  if (filter.flag) search.set('flag', filter.flag);
  const text = search.toString();
  return `/api${base(revisionId)}/export.csv${text ? `?${text}` : ''}`;
}
