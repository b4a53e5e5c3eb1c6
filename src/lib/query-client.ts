import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client.ts';

/** On a 401 the session is stale: refresh it once, here, for every query and mutation. */
function handleError(error: unknown) {
  if (error instanceof ApiError && error.status === 401) void queryClient.invalidateQueries({ queryKey: ['session'] });
}

export const queryClient = new QueryClient({
  queryCache: new QueryCache({ onError: handleError }),
  mutationCache: new MutationCache({ onError: handleError }),
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      retry: (count, error) => !(error instanceof ApiError && error.status < 500) && count < 2,
    },
  },
});
