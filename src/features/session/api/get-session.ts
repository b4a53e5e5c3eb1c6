import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import type { SessionDto } from '@shared/schemas/user.ts';
import { api, setCsrfToken } from '@/lib/api-client.ts';

export const sessionQuery = queryOptions({
  queryKey: ['session'],
  queryFn: async ({ signal }) => {
    const s = await api.get<SessionDto>('/api/session', { signal });
    setCsrfToken(s.csrfToken);
    return s;
  },
  staleTime: 60_000,
});

/** A session the server answered with outside the query (sign-out): into the cache, its CSRF token to the API client. */
export function storeSession(qc: QueryClient, session: SessionDto): void {
  setCsrfToken(session.csrfToken);
  qc.setQueryData(sessionQuery.queryKey, session);
}

/** The signed-in user (or null) and the CSRF token. */
export const useSession = () => useQuery(sessionQuery);
