import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ApiTokenDto } from '@shared/schemas/api-token.ts';
import { api } from '@/lib/api-client.ts';
import { adminUserQueries } from './list-users.ts';

export const adminTokenQueries = {
  all: [...adminUserQueries.all, 'tokens'] as const,
  list: (userId: number) =>
    queryOptions({
      queryKey: [...adminTokenQueries.all, userId],
      queryFn: ({ signal }) => api.get<ApiTokenDto[]>(`/api/admin/users/${userId}/tokens`, { signal }),
    }),
};

/** An account's rig tokens, fetched only while the admin has the list open. */
export const useUserTokens = (userId: number, enabled: boolean) => useQuery({ ...adminTokenQueries.list(userId), enabled });

/** Revoke someone's token (a leaked or misbehaving rig). */
export function useRevokeUserToken() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, tokenId }: { userId: number; tokenId: number }) =>
      api.delete<void>(`/api/admin/users/${userId}/tokens/${tokenId}`),
    onSuccess: (_r, { userId }) => qc.invalidateQueries({ queryKey: adminTokenQueries.list(userId).queryKey }),
  });
}
