import { useMutation, useQueryClient, type Query, type QueryClient } from '@tanstack/react-query';
import type { SessionDto } from '@shared/schemas/user.ts';
import { api } from '@/lib/api-client.ts';
import { sessionQuery, storeSession } from './get-session.ts';

/** Every cached read but the session itself: the signed-in user's data. */
const usersData = { predicate: (q: Query) => q.queryKey[0] !== sessionQuery.queryKey[0] };

/** How long sign-out waits for the user's reads in flight before it aborts them. */
const SETTLE_MS = 5000;

/**
 * Resolves once none of the user's reads is in flight, or after SETTLE_MS with the rest aborted. A read answered
 * before the logout is a 200; one aborted while its page is still shown is sent again at once (its observers are
 * mounted) and could reach the server after the logout, a 401.
 */
function usersReadsSettled(qc: QueryClient): Promise<void> {
  return new Promise((resolve) => {
    let unsubscribe = () => {};
    const timer = setTimeout(() => void qc.cancelQueries(usersData).then(done), SETTLE_MS);
    function done() {
      clearTimeout(timer);
      unsubscribe();
      resolve();
    }
    const check = () => void (qc.isFetching(usersData) === 0 && done());
    unsubscribe = qc.getQueryCache().subscribe(check);
    check();
  });
}

/** End the session on the server, then forget everything cached for that user. */
export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    onMutate: () => usersReadsSettled(qc),
    // The answer is the new, signed-out session with its CSRF token: no second read of the session follows, so
    // nothing is in flight when the user starts signing in again (its cookie could replace the sign-in's).
    mutationFn: () => api.post<SessionDto>('/auth/logout'),
    onSuccess: (session) => {
      // The page says "signed out" before the user's data goes: the signed-in parts unmount at once, so none of
      // them reads its removed data again (401). Removing a query aborts its read if one started meanwhile.
      storeSession(qc, session);
      qc.removeQueries(usersData);
    },
  });
}
