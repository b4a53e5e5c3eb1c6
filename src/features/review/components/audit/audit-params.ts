import { auditQuery } from '@shared/schemas/review.ts';
import type { AuditFilters } from '@/features/review/api/get-audit.ts';

const FIELDS = ['actorId', 'targetType', 'targetId', 'from', 'to', 'page'] as const;

/** The audit filters held in the URL, each checked with the shared schema; anything malformed is ignored. */
export function filtersFromParams(params: URLSearchParams): AuditFilters {
  const out: Record<string, unknown> = {};
  for (const field of FIELDS) {
    const raw = params.get(field);
    if (!raw) continue;
    const parsed = auditQuery.shape[field].safeParse(raw);
    if (parsed.success && parsed.data !== undefined) out[field] = parsed.data;
  }
  return out as AuditFilters;
}

/** The filters as URL search parameters, leaving out empty ones and page 1. */
export function paramsFromFilters(filters: AuditFilters): Record<string, string> {
  const out: Record<string, string> = {};
  for (const field of FIELDS) {
    const v = filters[field];
    if (v === undefined || v === null || v === '' || (field === 'page' && v === 1)) continue;
    out[field] = String(v);
  }
  return out;
}
