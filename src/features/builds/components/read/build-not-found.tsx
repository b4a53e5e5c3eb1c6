import { Link } from 'react-router-dom';
import { paths } from '@/config/paths.ts';

/** The API's 404 for a build: it does not exist, or it is not published and the viewer is not its maker. */
export function BuildNotFound({ signedIn }: { signedIn: boolean }) {
  return (
    <div className="mx-auto max-w-xl py-12 text-center">
      <h1 className="text-xl font-semibold">No such build (or it is not published)</h1>
      <p className="mt-2 text-ink-soft">
        Drafts and builds under review are visible only to their maker and to moderators.
        {signedIn ? '' : ' If this is your build, sign in to see it.'}
      </p>
      <p className="mt-6 flex justify-center gap-4">
        <Link className="text-copper underline" to={paths.builds}>
          All published builds
        </Link>
        {signedIn && (
          <Link className="text-copper underline" to={paths.myBuilds}>
            My builds
          </Link>
        )}
      </p>
    </div>
  );
}
