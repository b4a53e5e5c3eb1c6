import type { AuditFilters } from '@/features/review/api/get-audit.ts';
import { targetTypeLabels } from './audit-labels.ts';

/** How many entries match, and the one filter the form cannot show: a single thing picked by a link. */
export function AuditFilterSummary({
  filters,
  total,
  onClearThing,
}: {
  filters: AuditFilters;
  total: number | undefined;
  onClearThing: () => void;
}) {
  return (
    <div className="mb-3 flex flex-wrap items-center gap-3 text-sm">
      {total !== undefined && (
        <span role="status">
          <span className="num">{total}</span> {total === 1 ? 'entry' : 'entries'}
        </span>
      )}
      {filters.targetId && (
        <span className="inline-flex items-center gap-2 rounded-full border border-teal bg-white px-2 py-0.5">
          Only {(targetTypeLabels[filters.targetType ?? ''] ?? 'thing').toLowerCase()} <span className="num">#{filters.targetId}</span>
          <button type="button" className="text-copper underline" onClick={onClearThing}>
            show all
          </button>
        </span>
      )}
    </div>
  );
}
