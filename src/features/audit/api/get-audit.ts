import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { auditListSchema } from '../../../../shared/schemas/audit';
import { api } from '../../../lib/api-client';

export interface AuditListParams {
  page: number;
  pageSize: number;
  actor?: string;
  entityType?: string;
  from?: string;
  to?: string;
}

export const auditQueryOptions = (params: AuditListParams) =>
  queryOptions({
    queryKey: ['audit', 'list', params],
    queryFn: ({ signal }) => api.get('/audit', { ...params }, { schema: auditListSchema, signal }),
    placeholderData: keepPreviousData,
  });

export const useAudit = (params: AuditListParams) => useQuery(auditQueryOptions(params));
