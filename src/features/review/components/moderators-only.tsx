import { PageHeader } from '@/components/ui/page-header.tsx';
import { AnchorButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';

/** What anyone but a moderator sees at the review desk's addresses. */
export function ModeratorsOnly({ title, signedIn, returnTo }: { title: string; signedIn: boolean; returnTo: string }) {
  return (
    <div>
      <PageHeader title={title} />
      <div className="max-w-xl rounded-lg border border-rule bg-white p-5">
        <p>Only moderators can open the review desk.</p>
        {!signedIn && (
          <p className="mt-4">
            <AnchorButton href={paths.signIn(returnTo)}>Sign in</AnchorButton>
          </p>
        )}
      </div>
    </div>
  );
}
