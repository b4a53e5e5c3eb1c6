import { useQuery } from '@tanstack/react-query';
import type { ListPartsQuery } from '@shared/schemas/part.ts';
import { partQueries } from '@/lib/part-queries.ts';

/** The picker's search: up to 10 listed parts matching the text. */
export const usePartSearch = (q: string, category?: ListPartsQuery['category']) =>
  useQuery({ ...partQueries.list({ q: q.trim() || undefined, category, pageSize: 10 }), staleTime: 60_000 });
