import { useQuery } from '@tanstack/react-query';
import { Link, useLocation } from 'react-router-dom';
import { can } from '@shared/policies.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { AnchorButton, LinkButton } from '@/components/ui/link-button.tsx';
import { Pager } from '@/components/ui/pager.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { toActor } from '@/features/session/to-actor.ts';
import { partQueries } from '@/lib/part-queries.ts';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { PartFilters } from '@/features/parts/components/part-filters.tsx';
import { PartsTable } from '@/features/parts/components/parts-table.tsx';
import { ResultsBar } from '@/features/parts/components/results-bar.tsx';
import { usePartSearch } from '@/features/parts/components/use-part-search.ts';
import { RegistryDownloads } from '@/features/parts/components/registry-downloads.tsx';

/** /parts: every listed part with figures pooled from accepted runs, searchable by measured gain. */
export function PartsIndexPage() {
  const { data: session } = useSession();
  const location = useLocation();
  const search = usePartSearch();
  const parts = useQuery(partQueries.list(search.query));
  const action = can(toActor(session?.user ?? null), 'content.create') ? (
    <LinkButton to={paths.proposePart}>Propose a part</LinkButton>
  ) : session?.user ? null : (
    <AnchorButton variant="secondary" href={paths.signIn(location.pathname + location.search)}>
      Sign in to propose a part
    </AnchorButton>
  );
  const pageCount = parts.data ? Math.max(1, Math.ceil(parts.data.total / parts.data.pageSize)) : 1;
  return (
    <div>
      <PageHeader
        title="Parts registry"
        lead="Salvaged transducers with figures pooled from every accepted calibration run. Search by measured gain, voltage and how many people measured it."
        actions={action}
      />
      <PartFilters search={search} />
      <ResultsBar search={search} total={parts.data?.total} unratedHidden={parts.data?.unratedHidden} />
      {parts.isPending ? (
        <Loading>Loading the registry…</Loading>
      ) : parts.isError ? (
        <LoadError what="the parts registry" error={parts.error} onRetry={() => void parts.refetch()} />
      ) : parts.data.items.length === 0 ? (
        <div className="rounded-lg border border-dashed border-rule bg-white p-6 text-center">
          <p className="font-medium">{search.filtered ? 'No listed part matches these filters.' : 'No parts are listed yet.'}</p>
          {search.filtered && (
            <p className="mt-1 text-sm text-ink-soft">
              Try a wider gain range, or{' '}
              <Link to={search.clearHref} className="text-copper-dark underline">
                clear the filters
              </Link>
              .
            </p>
          )}
        </div>
      ) : (
        <>
          <PartsTable data={parts.data} search={search} stale={parts.isPlaceholderData} />
          <Pager page={search.page} pageCount={pageCount} hrefFor={search.hrefFor} label="Registry pages" />
        </>
      )}
      <RegistryDownloads />
    </div>
  );
}
