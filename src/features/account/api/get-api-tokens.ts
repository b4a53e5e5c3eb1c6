import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ApiTokenDto } from '@shared/schemas/api-token.ts';
import { api } from '@/lib/api-client.ts';
import { accountKeys } from './get-account-settings.ts';

/** The signed-in person's rig tokens (names, scopes and dates; never the secrets). */
export const apiTokensQuery = queryOptions({
  queryKey: [...accountKeys.all, 'tokens'] as const,
  queryFn: ({ signal }) => api.get<ApiTokenDto[]>('/api/account/tokens', { signal }),
});

export const useApiTokens = () => useQuery(apiTokensQuery);
