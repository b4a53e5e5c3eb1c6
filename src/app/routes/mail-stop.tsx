import { useParams } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { Button } from '@/components/ui/button.tsx';
import { LinkButton } from '@/components/ui/link-button.tsx';
import { Loading } from '@/components/ui/load-states.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { errorMessage } from '@/components/ui/form-bits.tsx';
import { paths } from '@/config/paths.ts';
import { mailStopQuery, useMailStop } from '@/features/account/api/mail-stop.ts';

const TITLE = 'Stop a kind of mail';

/**
 * /mail/stop/:userId/:kind/:token, the link at the foot of each mail: says which mail stops and asks for one click
 * (opening the link changes nothing, so a mail scanner that follows it does not unsubscribe anyone).
 */
export function MailStopPage() {
  const { userId = '', kind = '', token = '' } = useParams();
  const tail = [userId, kind, token].map(encodeURIComponent).join('/');
  const state = useQuery(mailStopQuery(tail));
  const stop = useMailStop(tail);
  if (state.isPending) return <Loading>Checking the link…</Loading>;
  if (state.isError)
    return (
      <div>
        <PageHeader title={TITLE} />
        <Notice tone="danger" title="This link does not work">
          <p>{errorMessage(state.error)}</p>
          <p className="mt-2">
            <LinkButton to={paths.account}>Open your mail settings</LinkButton>
          </p>
        </Notice>
      </div>
    );
  return (
    <div className="max-w-xl">
      <PageHeader title={TITLE} />
      <div className="space-y-4 rounded-lg border border-rule bg-white p-5">
        {state.data.on ? (
          <>
            <p>
              Stop mails about <span className="font-medium">{state.data.title.toLowerCase()}</span>? You will still see them on your
              notifications page when you sign in.
            </p>
            <Button disabled={stop.isPending} onClick={() => stop.mutate()}>
              {stop.isPending ? 'Stopping…' : 'Stop these mails'}
            </Button>
            {stop.isError && (
              <p role="alert" className="text-sm text-danger">
                {errorMessage(stop.error)}
              </p>
            )}
          </>
        ) : (
          <p role="status">
            Done: no more mails about <span className="font-medium">{state.data.title.toLowerCase()}</span>. You can turn them on again in
            your mail settings.
          </p>
        )}
        <p className="text-sm text-ink-soft">
          Other kinds of mail are in your{' '}
          <a className="text-copper underline" href={paths.account}>
            mail settings
          </a>{' '}
          (sign-in needed).
        </p>
      </div>
    </div>
  );
}
