import { QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';
import { currentAccountQueryKey } from './auth/current-account';

// Retrying a 4xx only repeats the same answer; retry network blips and 5xx a couple of times.
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      // A 401 from any query means the session ended (expired, signed out in another tab):
      // mark the baker signed out so the route guard sends them to sign in.
      onError: (error) => {
        if (isApiError(error) && error.status === 401) {
          queryClient.setQueryData(currentAccountQueryKey, null);
        }
      },
    }),
    defaultOptions: {
      queries: { staleTime: 30_000, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
  return queryClient;
}
