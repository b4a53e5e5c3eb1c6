import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AccountSettingsInput } from '@shared/schemas/review.ts';
import { api } from '@/lib/api-client.ts';
import { accountSettingsQuery, type AccountSettingsDto } from './get-account-settings.ts';

/** Turn non-essential mail on or off; the answer replaces the cached settings. */
export function useUpdateAccountSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: AccountSettingsInput) => api.patch<AccountSettingsDto>('/api/account/settings', input),
    onSuccess: (data) => qc.setQueryData(accountSettingsQuery.queryKey, data),
  });
}
