import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateApiTokenInput, CreatedApiTokenDto } from '@shared/schemas/api-token.ts';
import { api } from '@/lib/api-client.ts';
import { apiTokensQuery } from './get-api-tokens.ts';

/** Make a rig token; the answer carries the secret, which is never fetched again. */
export function useCreateApiToken() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateApiTokenInput) => api.post<CreatedApiTokenDto>('/api/account/tokens', input),
    onSuccess: () => qc.invalidateQueries({ queryKey: apiTokensQuery.queryKey }),
  });
}
