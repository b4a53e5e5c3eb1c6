import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionDto } from '@shared/schemas/user.ts';
import { api, setCsrfToken } from '@/lib/api-client.ts';

/** End the session on the server, then forget everything cached for that user. */
export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    // A signed-in read still in flight when the session ends would come back 401: abort them first (every query
    // hands its AbortSignal to the API client, so the browser drops the request rather than logging its answer).
    onMutate: () => qc.cancelQueries({ predicate: (q) => q.queryKey[0] !== 'session' }),
    // The answer is the new, signed-out session with its CSRF token: no second read of the session follows, so
    // nothing is in flight when the user starts signing in again (its cookie could replace the sign-in's).
    mutationFn: () => api.post<SessionDto>('/auth/logout'),
    onSuccess: (session) => {
      // The page says "signed out" before the user's data goes: the signed-in parts unmount at once, so none of
      // them reads its removed data again (401).
      setCsrfToken(session.csrfToken);
      qc.setQueryData<SessionDto>(['session'], session);
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== 'session' });
    },
  });
}
