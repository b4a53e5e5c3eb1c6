import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import { apiTokensQuery } from './get-api-tokens.ts';

/** Revoke a rig token: scripts using it get 401 from then on. */
export function useRevokeApiToken() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (tokenId: number) => api.delete<void>(`/api/account/tokens/${tokenId}`),
    onSuccess: () => qc.invalidateQueries({ queryKey: apiTokensQuery.queryKey }),
  });
}
