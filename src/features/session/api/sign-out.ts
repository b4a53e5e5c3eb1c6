import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SessionDto } from '@shared/schemas/user.ts';
import { api } from '@/lib/api-client.ts';

/** End the session on the server, then forget everything cached for that user and read the session again. */
export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    // A signed-in read still in flight when the session ends would come back 401: stop them first.
    onMutate: () => qc.cancelQueries({ predicate: (q) => q.queryKey[0] !== 'session' }),
    mutationFn: () => api.post<void>('/auth/logout'),
    onSuccess: async () => {
      // The page says "signed out" before the user's data goes: the signed-in parts unmount at once, so none of
      // them reads its removed data again (401) while the session is re-read for a fresh CSRF token.
      qc.setQueryData<SessionDto>(['session'], (s) => s && { ...s, user: null });
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== 'session' });
      await qc.refetchQueries({ queryKey: ['session'] });
    },
  });
}
