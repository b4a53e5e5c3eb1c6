import { useQuery } from '@tanstack/react-query';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { AnchorButton, LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { buildQueries } from '@/features/builds/api/build-queries.ts';
import { LoadError, Loading } from '@/components/ui/load-states.tsx';
import { MyBuildRow } from '@/features/builds/components/read/my-build-row.tsx';

const lead = 'Every build you have started, in any state, with notes from the review desk.';

/** /builds/mine: the signed-in maker's builds and where each stands in review; visitors get a sign-in prompt. */
export function MyBuildsPage() {
  const session = useSession();
  const signedIn = Boolean(session.data?.user);
  const mine = useQuery({ ...buildQueries.mine(), enabled: signedIn });

  if (session.isPending) return <Loading>Checking who is signed in…</Loading>;
  if (!signedIn) {
    return (
      <div>
        <PageHeader title="My builds" lead={lead} />
        <div className="max-w-xl rounded-lg border border-rule bg-white p-5">
          <p>Sign in to see your builds, write new ones and read the review desk’s notes on them.</p>
          <p className="mt-4">
            <AnchorButton href={paths.signIn(paths.myBuilds)}>Sign in</AnchorButton>
          </p>
        </div>
      </div>
    );
  }
  return (
    <div>
      <PageHeader title="My builds" lead={lead} actions={<LinkButton to={paths.newBuild}>Write a build</LinkButton>} />
      {mine.isPending ? (
        <Loading>Loading your builds…</Loading>
      ) : mine.isError ? (
        <LoadError what="your builds" error={mine.error} onRetry={() => void mine.refetch()} />
      ) : mine.data.items.length === 0 ? (
        <p className="rounded-lg border border-dashed border-rule bg-white p-6 text-center">
          You have not started a build yet. Write one: a title and a sentence are enough to begin.
        </p>
      ) : (
        <>
          <p role="status" className="mb-3 text-sm text-ink-soft">
            <span className="num">{mine.data.total}</span> {mine.data.total === 1 ? 'build' : 'builds'}
          </p>
          <ul className="space-y-3">
            {mine.data.items.map((b) => (
              <MyBuildRow key={b.id} build={b} />
            ))}
          </ul>
        </>
      )}
    </div>
  );
}
