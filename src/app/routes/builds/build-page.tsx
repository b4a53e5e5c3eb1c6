import { parseId } from '@/utils/parse-id.ts';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { ApiError } from '@/lib/api-client.ts';
import { can } from '@shared/policies.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { useScrollToHash } from '@/hooks/use-scroll-to-hash.ts';
import { toActor } from '@/features/session/to-actor.ts';
import { buildQueries } from '@/features/builds/api/build-queries.ts';
import { BuildNotFound } from '@/features/builds/components/read/build-not-found.tsx';
import { BuildView } from '@/features/builds/components/read/build-view.tsx';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';

/** /builds/:buildId: one build with its write-up, photos, log entries, actuators and calibration runs. */
export function BuildPage() {
  const id = parseId(useParams().buildId);
  const { data: session } = useSession();
  const build = useQuery({ ...buildQueries.detail(id ?? 0), enabled: id !== null && id > 0 });
  const user = session?.user ?? null;
  useScrollToHash(Boolean(build.data));
  if (id === null || id <= 0) return <BuildNotFound signedIn={user !== null} />;
  if (build.isPending) return <Loading>Loading the build…</Loading>;
  if (build.isError) {
    if (build.error instanceof ApiError && build.error.status === 404) return <BuildNotFound signedIn={user !== null} />;
    return <LoadError what="this build" error={build.error} onRetry={() => void build.refetch()} />;
  }
  const owner = user?.id === build.data.owner.id;
  const moderator = can(toActor(user), 'review.access');
  return (
    <BuildView
      build={build.data}
      viewerIsOwner={owner}
      signedIn={user !== null}
      reviewSide={owner ? 'maker' : moderator ? 'moderator' : null}
      viewerId={user?.id ?? null}
    />
  );
}
