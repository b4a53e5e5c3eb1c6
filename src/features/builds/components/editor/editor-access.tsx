import { Link } from 'react-router-dom';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';

/** Visitors are asked to sign in before they can write. */
export function SignInToEdit({ title, returnTo }: { title: string; returnTo: string }) {
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader title={title} />
      <Notice title="Sign in to write builds">
        <p>Build logs are written by signed-in makers.</p>
        <p>
          <a className="font-medium text-copper underline" href={paths.signIn(returnTo)}>
            Sign in
          </a>{' '}
          and you will come back here.
        </p>
      </Notice>
    </div>
  );
}

/** Someone else's build, or one that does not exist (drafts of others are invisible, so both look alike). */
export function CannotEdit({ reason, buildId }: { reason: 'not-owner' | 'missing'; buildId: number }) {
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader title="Edit build" />
      <Notice tone="caution" title={reason === 'not-owner' ? 'Only the owner can edit this build' : 'No build to edit here'}>
        {reason === 'not-owner' ? (
          <p>This build belongs to another maker. You can read it, report it, or start a build of your own.</p>
        ) : (
          <p>There is no build at this address that you can edit. It may have been deleted, or it is another maker's draft.</p>
        )}
        <p className="flex flex-wrap gap-4">
          {reason === 'not-owner' && (
            <Link className="font-medium text-copper underline" to={paths.build(buildId)}>
              Read the build
            </Link>
          )}
          <Link className="font-medium text-copper underline" to={paths.myBuilds}>
            My builds
          </Link>
          <Link className="font-medium text-copper underline" to={paths.newBuild}>
            Start a new build
          </Link>
        </p>
      </Notice>
    </div>
  );
}
