import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { userListSchema } from '../../../../shared/schemas/users';
import { api } from '../../../lib/api-client';

export interface UserListParams {
  page: number;
  pageSize: number;
  q?: string;
}

export const usersQueryOptions = (params: UserListParams) =>
  queryOptions({
    queryKey: ['users', 'list', params],
    queryFn: ({ signal }) => api.get('/users', { ...params }, { schema: userListSchema, signal }),
    placeholderData: keepPreviousData,
  });

export const useUsers = (params: UserListParams) => useQuery(usersQueryOptions(params));
