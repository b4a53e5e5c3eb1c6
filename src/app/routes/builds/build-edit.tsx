import { Loading } from '@/components/ui/load-states.tsx';
import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { buildStatusLabels } from '@shared/schemas/build-vocabulary.ts';
import { ApiError } from '@/lib/api-client.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { useScrollToHash } from '@/hooks/use-scroll-to-hash.ts';
import { buildQueries } from '@/features/builds/api/build-queries.ts';
import { BuildEditor } from '@/features/builds/components/editor/build-editor.tsx';
import { CannotEdit, SignInToEdit } from '@/features/builds/components/editor/editor-access.tsx';

/** The owner's editor for one build; everyone else is told plainly why they cannot edit it. */
export function BuildEditPage() {
  const buildId = Number(useParams().buildId);
  const valid = Number.isInteger(buildId) && buildId > 0;
  const { data: session } = useSession();
  const signedIn = Boolean(session?.user);
  const build = useQuery({ ...buildQueries.detail(buildId), enabled: valid && signedIn });
  useScrollToHash(Boolean(build.data));

  if (session && !signedIn) return <SignInToEdit title="Edit build" returnTo={valid ? paths.editBuild(buildId) : paths.myBuilds} />;
  if (!valid || (build.error instanceof ApiError && build.error.status === 404)) return <CannotEdit reason="missing" buildId={buildId} />;
  if (build.isError) {
    return (
      <div className="mx-auto max-w-3xl">
        <PageHeader title="Edit build" />
        <p role="alert" className="text-danger">
          {build.error.message}
        </p>
      </div>
    );
  }
  if (!build.data || !session?.user) return <Loading>Loading the build…</Loading>;
  if (build.data.owner.id !== session.user.id) return <CannotEdit reason="not-owner" buildId={buildId} />;

  const b = build.data;
  return (
    <div className="mx-auto max-w-4xl">
      <PageHeader
        title={b.title}
        lead={
          <>
            {b.abilities.edit && 'Editing · '}
            <span className="font-medium text-ink">{buildStatusLabels[b.status]}</span>
          </>
        }
        actions={
          <Link
            to={paths.build(b.id)}
            className="rounded-md border border-teal px-3 py-1.5 text-sm font-medium text-teal-dark hover:bg-teal/10"
          >
            View build page
          </Link>
        }
      />
      <BuildEditor build={b} />
    </div>
  );
}
