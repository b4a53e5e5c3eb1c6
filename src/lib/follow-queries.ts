import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { FollowDto, FollowStateDto, FollowTargetType } from '@shared/schemas/follow.ts';
import { api } from './api-client.ts';

/** Follows: one key tree for a target's state and the maker's own list. */
export const followQueries = {
  all: ['follows'] as const,
  state: (type: FollowTargetType, id: number) =>
    queryOptions({
      queryKey: ['follows', 'state', type, id] as const,
      queryFn: ({ signal }) => api.get<FollowStateDto>(`/api/follows/${type}/${id}`, { signal }),
    }),
  mine: () =>
    queryOptions({
      queryKey: ['follows', 'mine'] as const,
      queryFn: ({ signal }) => api.get<{ items: FollowDto[] }>('/api/follows/mine', { signal }),
    }),
};

/** Follow or stop following; the state and my list refresh. */
export function useSetFollow(type: FollowTargetType, id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (follow: boolean): Promise<void> => {
      if (follow) await api.put<FollowStateDto>(`/api/follows/${type}/${id}`, {});
      else await api.delete<void>(`/api/follows/${type}/${id}`);
    },
    onSuccess: () => qc.invalidateQueries({ queryKey: followQueries.all }),
  });
}
