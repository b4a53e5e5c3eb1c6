import { Loading } from '@/components/ui/load-states.tsx';
import { useSearchParams } from 'react-router-dom';
import { can } from '@shared/policies.ts';
import type { ReviewAuthorDto } from '@shared/schemas/review.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { Pager } from '@/components/ui/pager.tsx';
import { paths } from '@/config/paths.ts';
import { toQuery } from '@/lib/api-client.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { toActor } from '@/features/session/to-actor.ts';
import { useAuditTrail } from '@/features/review/api/get-audit.ts';
import { ModeratorsOnly } from '@/features/review/components/moderators-only.tsx';
import { AuditFiltersForm } from '@/features/review/components/audit/audit-filters.tsx';
import { AuditTable } from '@/features/review/components/audit/audit-table.tsx';
import { AuditFilterSummary } from '@/features/review/components/audit/audit-filter-summary.tsx';
import { filtersFromParams, paramsFromFilters } from '@/features/review/components/audit/audit-params.ts';

const TITLE = 'Audit trail';

/** /review/audit: every moderator decision, newest first; filters and page live in the URL. */
export function ReviewAuditPage() {
  const { data: session } = useSession();
  const allowed = can(toActor(session?.user ?? null), 'review.access');
  const [params, setParams] = useSearchParams();
  const filters = filtersFromParams(params);
  const trail = useAuditTrail(filters, allowed);
  const everyone = useAuditTrail({}, allowed);

  if (!allowed) return <ModeratorsOnly title={TITLE} signedIn={Boolean(session?.user)} returnTo={paths.reviewAudit} />;

  const actors = new Map<number, ReviewAuthorDto>();
  for (const e of [...(everyone.data?.items ?? []), ...(trail.data?.items ?? [])]) actors.set(e.actor.id, e.actor);
  if (filters.actorId && !actors.has(filters.actorId))
    actors.set(filters.actorId, { id: filters.actorId, login: `moderator #${filters.actorId}` });
  const pageCount = trail.data ? Math.max(1, Math.ceil(trail.data.total / trail.data.pageSize)) : 1;

  return (
    <div>
      <PageHeader
        title={TITLE}
        lead="Who decided what on the review desk, and which admin changed an account or revoked a token, when, and with which note. Newest first; dates in UTC."
        actions={
          <LinkButton variant="secondary" to={paths.review}>
            Back to the desk
          </LinkButton>
        }
      />
      <AuditFiltersForm
        filters={filters}
        actors={[...actors.values()].sort((a, b) => a.login.localeCompare(b.login))}
        onApply={(f) => setParams(paramsFromFilters(f))}
      />
      <AuditFilterSummary
        filters={filters}
        total={trail.data?.total}
        onClearThing={() => setParams(paramsFromFilters({ ...filters, targetId: undefined, page: undefined }))}
      />
      {trail.isPending && <Loading>Loading the audit trail…</Loading>}
      {trail.isError && (
        <p role="alert" className="text-danger">
          The audit trail did not load: {trail.error.message}
        </p>
      )}
      {trail.data &&
        (trail.data.items.length === 0 ? (
          <p className="rounded-lg border border-dashed border-rule bg-white p-6 text-center text-ink-soft">
            No entries match these filters.
          </p>
        ) : (
          <div className="rounded-lg border border-rule bg-white px-3 py-1 sm:px-1">
            <AuditTable items={trail.data.items} />
          </div>
        ))}
      <Pager
        page={filters.page ?? 1}
        pageCount={pageCount}
        label="Audit trail pages"
        hrefFor={(p) => `${paths.reviewAudit}${toQuery(paramsFromFilters({ ...filters, page: p }))}`}
      />
    </div>
  );
}
