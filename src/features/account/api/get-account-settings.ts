import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailChoices } from '@shared/schemas/mail-choices.ts';
import { api } from '@/lib/api-client.ts';

/** The signed-in person's own settings, and the address mail goes to. */
export interface AccountSettingsDto {
  mailOptOut: boolean;
  /** Each kind of mail on or off. */
  mailChoices: MailChoices;
  email: string | null;
}

export const accountKeys = { all: ['account'] as const };

export const accountSettingsQuery = queryOptions({
  queryKey: [...accountKeys.all, 'settings'] as const,
  queryFn: ({ signal }) => api.get<AccountSettingsDto>('/api/account/settings', { signal }),
});

export const useAccountSettings = (enabled: boolean) => useQuery({ ...accountSettingsQuery, enabled });
