import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { DataLicenceAcceptanceDto } from '@shared/schemas/data-licence.ts';
import { api } from '@/lib/api-client.ts';

const dataLicenceQuery = queryOptions({
  queryKey: ['account', 'data-licence'],
  queryFn: ({ signal }) => api.get<DataLicenceAcceptanceDto>('/api/account/data-licence', { signal }),
  staleTime: 5 * 60_000,
  retry: false,
});

/** Whether the signed-in maker accepted the data licence (401 for visitors: the notice then stays away). */
export const useDataLicence = () => useQuery(dataLicenceQuery);

/** Accept the data licence once; the session's copy of the date follows. */
export function useAcceptDataLicence() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<DataLicenceAcceptanceDto>('/api/account/data-licence'),
    onSuccess: async (dto) => {
      qc.setQueryData(dataLicenceQuery.queryKey, dto);
      await qc.invalidateQueries({ queryKey: ['session'] });
    },
  });
}
