import { useQuery } from '@tanstack/react-query';
import { useLocation } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { AnchorButton, LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { buildQueries } from '@/features/builds/api/build-queries.ts';
import { BuildFilters } from '@/features/builds/components/read/build-filters.tsx';
import { BuildResults } from '@/features/builds/components/read/build-results.tsx';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { useBuildSearch } from '@/features/builds/components/read/use-build-search.ts';

/** /builds: published build logs, searchable by words and instrument kind, a page at a time. */
export function BuildsIndexPage() {
  const { data: session } = useSession();
  const location = useLocation();
  const search = useBuildSearch();
  const builds = useQuery(buildQueries.list(search.query));
  const action = session?.user ? (
    <LinkButton to={paths.newBuild}>Write a build</LinkButton>
  ) : (
    <AnchorButton variant="secondary" href={paths.signIn(location.pathname + location.search)}>
      Sign in to write a build
    </AnchorButton>
  );
  return (
    <div>
      <PageHeader
        title="Builds"
        lead="Build logs of home-made scanning probe instruments: write-ups, photos, log entries, and every actuator with its calibration runs."
        actions={action}
      />
      <BuildFilters search={search} />
      {builds.isPending ? (
        <Loading>Loading published builds…</Loading>
      ) : builds.isError ? (
        <LoadError what="the builds" error={builds.error} onRetry={() => void builds.refetch()} />
      ) : (
        <BuildResults data={builds.data} search={search} stale={builds.isPlaceholderData} />
      )}
    </div>
  );
}
