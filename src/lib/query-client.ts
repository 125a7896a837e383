import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';

/** Errors a retry cannot fix: the request itself or the session is wrong. */
function isPermanent(error: unknown): boolean {
  return isApiError(error) && error.status >= 400 && error.status < 500;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (failureCount, error) => !isPermanent(error) && failureCount < 2,
      },
      mutations: { retry: false },
    },
  });
}

export const queryClient = createQueryClient();
