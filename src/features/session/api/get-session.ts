import { queryOptions, useQuery } from '@tanstack/react-query';
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

/** The signed-in user (or null) and the CSRF token. */
export const useSession = () => useQuery(sessionQuery);
