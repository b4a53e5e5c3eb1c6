import type { FormEvent } from 'react';
import type { ReviewAuthorDto } from '@shared/schemas/review.ts';
import type { AuditFilters as Filters } from '@/features/review/api/get-audit.ts';
import { Button } from '@/components/ui/button.tsx';
import { AUDIT_TARGET_TYPES, targetTypeLabels } from './audit-labels.ts';

const control = 'h-10 w-full rounded-md border border-rule bg-white px-2 text-base';

/**
 * Moderator, thing and date range for the audit trail. The form only reports what was chosen;
 * the page keeps the filters in its URL. Changing a filter starts again at page 1.
 */
export function AuditFiltersForm({
  filters,
  actors,
  onApply,
}: {
  filters: Filters;
  actors: ReviewAuthorDto[];
  onApply: (next: Filters) => void;
}) {
  const handleSubmit = (e: FormEvent<HTMLFormElement>) => {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const text = (k: string) => String(data.get(k) ?? '').trim() || undefined;
    const actorId = Number(text('actorId'));
    const type = text('targetType') as Filters['targetType'];
    onApply({
      actorId: Number.isInteger(actorId) && actorId > 0 ? actorId : undefined,
      targetType: type,
      targetId: type && type === filters.targetType ? filters.targetId : undefined,
      from: text('from'),
      to: text('to'),
    });
  };

  return (
    <form
      role="search"
      aria-label="Filter the audit trail"
      onSubmit={handleSubmit}
      key={JSON.stringify(filters)}
      className="mb-4 grid gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-2 lg:grid-cols-[1fr_1fr_auto_auto_auto] lg:items-end"
    >
      <div>
        <label htmlFor="audit-actor" className="mb-1 block text-sm font-medium">
          Moderator
        </label>
        <select id="audit-actor" name="actorId" defaultValue={filters.actorId ?? ''} className={control}>
          <option value="">Everyone</option>
          {actors.map((a) => (
            <option key={a.id} value={a.id}>
              {a.login}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="audit-type" className="mb-1 block text-sm font-medium">
          Thing
        </label>
        <select id="audit-type" name="targetType" defaultValue={filters.targetType ?? ''} className={control}>
          <option value="">Any kind</option>
          {AUDIT_TARGET_TYPES.map((t) => (
            <option key={t} value={t}>
              {targetTypeLabels[t]}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="audit-from" className="mb-1 block text-sm font-medium">
          From (UTC)
        </label>
        <input id="audit-from" name="from" type="date" defaultValue={filters.from ?? ''} className={`${control} num`} />
      </div>
      <div>
        <label htmlFor="audit-to" className="mb-1 block text-sm font-medium">
          To (UTC)
        </label>
        <input id="audit-to" name="to" type="date" defaultValue={filters.to ?? ''} className={`${control} num`} />
      </div>
      <div className="flex gap-2 sm:col-span-2 lg:col-span-1">
        <Button type="submit">Show</Button>
        <Button variant="ghost" onClick={() => onApply({})}>
          Clear
        </Button>
      </div>
    </form>
  );
}
