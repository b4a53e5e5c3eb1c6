import { PageHeader } from '@/components/ui/page-header.tsx';
import { AnchorButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { MailSettings } from '@/features/account/components/mail-settings.tsx';
import { RigTokens } from '@/features/account/components/rig-tokens.tsx';

const TITLE = 'Account settings';

/** /account: the signed-in person's own settings: which e-mail they get, and their rig tokens. */
export function AccountSettingsPage() {
  const { data: session } = useSession();
  if (!session?.user) {
    return (
      <div>
        <PageHeader title={TITLE} />
        <div className="max-w-xl rounded-lg border border-rule bg-white p-5">
          <p>Sign in to choose which e-mail Scanwright sends you.</p>
          <p className="mt-4">
            <AnchorButton href={paths.signIn(paths.account)}>Sign in</AnchorButton>
          </p>
        </div>
      </div>
    );
  }
  return (
    <div>
      <PageHeader
        title={TITLE}
        lead={
          <>
            Signed in as <span className="font-medium text-ink">{session.user.login}</span>.
          </>
        }
      />
      <MailSettings />
      <RigTokens />
    </div>
  );
}
