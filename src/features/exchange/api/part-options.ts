import { useQuery } from '@tanstack/react-query';
import { partQueries } from '@/lib/part-queries.ts';

/** Listed parts whose name or salvage source matches, for the listing form's part picker. */
export function usePartOptions(q: string) {
  return useQuery({ ...partQueries.list({ q: q.trim() || undefined, pageSize: 12, sort: 'name' }), staleTime: 60_000 });
}

/** The picked part's name, when a form starts from a part id (?partId= or an existing listing). */
export function usePickedPart(id: number | undefined) {
  return useQuery({ ...partQueries.detail(id ?? 0), enabled: id !== undefined, staleTime: 60_000 });
}
