import { NotFound } from '@/components/ui/load-states.tsx';
import { paths } from '@/config/paths.ts';

/** The API's 404 for a build: it does not exist, or it is not published and the viewer is not its maker. */
export function BuildNotFound({ signedIn }: { signedIn: boolean }) {
  return (
    <NotFound
      title="No such build (or it is not published)"
      reason={`Drafts and builds under review are visible only to their maker and to moderators.${signedIn ? '' : ' If this is your build, sign in to see it.'}`}
      links={[{ to: paths.builds, label: 'All published builds' }, ...(signedIn ? [{ to: paths.myBuilds, label: 'My builds' }] : [])]}
    />
  );
}
