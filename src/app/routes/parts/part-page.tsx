import { parseId } from '@/utils/parse-id.ts';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { ApiError } from '@/lib/api-client.ts';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { partQueries } from '@/lib/part-queries.ts';
import { LoadError, Loading, NotFound } from '@/components/ui/load-states.tsx';
import { PartView } from '@/features/parts/components/part-view.tsx';

function PartNotFound() {
  return (
    <NotFound
      title="No such part in the registry"
      reason="It may have been merged into another entry, or it has not been accepted yet."
      links={[{ to: paths.parts, label: 'Search the parts registry' }]}
    />
  );
}

/** /parts/:partId: one part with its pooled figures, every accepted run, and open listings. */
export function PartPage() {
  const id = parseId(useParams().partId);
  const { data: session } = useSession();
  const part = useQuery({ ...partQueries.detail(id ?? 0), enabled: id !== null });
  if (id === null) return <PartNotFound />;
  if (part.isPending) return <Loading>Loading the part…</Loading>;
  if (part.isError) {
    if (part.error instanceof ApiError && part.error.status === 404) return <PartNotFound />;
    return <LoadError what="this part" error={part.error} onRetry={() => void part.refetch()} />;
  }
  return <PartView part={part.data} signedIn={Boolean(session?.user)} />;
}
