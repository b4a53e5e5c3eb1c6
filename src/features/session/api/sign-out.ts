import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';

/** End the session on the server, then forget everything cached for that user. */
export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    // A signed-in read still in flight when the session ends would come back 401: stop them first.
    onMutate: () => qc.cancelQueries({ predicate: (q) => q.queryKey[0] !== 'session' }),
    mutationFn: () => api.post<void>('/auth/logout'),
    onSuccess: async () => {
      qc.removeQueries({ predicate: (q) => q.queryKey[0] !== 'session' });
      await qc.refetchQueries({ queryKey: ['session'] });
    },
  });
}
