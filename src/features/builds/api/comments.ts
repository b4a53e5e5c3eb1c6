import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { BuildCommentDto, CreateCommentInput, HideCommentInput } from '@shared/schemas/comment.ts';
import type { CreateReportInput } from '@shared/schemas/review.ts';
import { api } from '@/lib/api-client.ts';
import { buildQueries } from './build-queries.ts';

/** A published build's comments, under the builds key tree. */
export const commentsQuery = (buildId: number) =>
  queryOptions({
    queryKey: [...buildQueries.all, 'comments', buildId] as const,
    queryFn: ({ signal }) => api.get<{ items: BuildCommentDto[] }>(`/api/builds/${buildId}/comments`, { signal }),
  });

export function useCreateComment(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateCommentInput) => api.post<BuildCommentDto>(`/api/builds/${buildId}/comments`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: commentsQuery(buildId).queryKey }),
  });
}

export function useHideComment(buildId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ commentId, ...input }: HideCommentInput & { commentId: number }) =>
      api.post<void>(`/api/comments/${commentId}/hide`, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: commentsQuery(buildId).queryKey }),
  });
}

/** Report a comment to the moderators (a reason and an optional note). */
export function useReportComment() {
  return useMutation({
    mutationFn: (input: Omit<CreateReportInput, 'targetType'>) =>
      api.post<{ id: number }>('/api/reports', { ...input, targetType: 'comment' }),
  });
}
