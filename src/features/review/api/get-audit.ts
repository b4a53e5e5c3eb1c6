import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditListDto, AuditQuery } from '@shared/schemas/review.ts';
import { api, toQuery } from '@/lib/api-client.ts';
import { reviewKeys } from './get-review-queue.ts';

/** Filters of the audit trail as the page keeps them in its URL. */
export type AuditFilters = Partial<Omit<AuditQuery, 'pageSize'>>;

/** One page of the audit trail, newest first. */
export const auditQueryOptions = (filters: AuditFilters) =>
  queryOptions({
    queryKey: [...reviewKeys.all, 'audit', filters] as const,
    queryFn: ({ signal }) => api.get<AuditListDto>(`/api/review/audit${toQuery(filters)}`, { signal }),
    placeholderData: keepPreviousData,
  });

export const useAuditTrail = (filters: AuditFilters, enabled: boolean) => useQuery({ ...auditQueryOptions(filters), enabled });
