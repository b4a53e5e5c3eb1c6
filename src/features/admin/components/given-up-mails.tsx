import { formatDateTime } from '@shared/format/dates.ts';
import { Button } from '@/components/ui/button.tsx';
import { Loading } from '@/components/ui/load-states.tsx';
import { useGivenUpMails, useRequeueMail } from '../api/given-up-mails.ts';

/** Mails the outbox stopped trying after its last attempt, each with a button that queues it again. */
export function GivenUpMails() {
  const mails = useGivenUpMails();
  const requeue = useRequeueMail();
  const items = mails.data?.items ?? [];
  return (
    <section aria-labelledby="given-up-mails" className="mt-10">
      <h2 id="given-up-mails" className="mb-1 text-lg font-semibold">
        Mails not delivered
      </h2>
      <p className="mb-3 text-sm text-ink-soft">
        The outbox tries each mail eight times over about an hour, then stops. Queue one again once the relay or the address is fixed; it is
        sent within seconds.
      </p>
      {mails.isError && (
        <p role="alert" className="text-danger">
          {mails.error.message}
        </p>
      )}
      {requeue.isError && (
        <p role="alert" className="text-danger">
          {requeue.error.message}
        </p>
      )}
      {mails.isPending ? (
        <Loading>Loading the undelivered mails…</Loading>
      ) : items.length === 0 ? (
        <p className="text-sm">Every mail so far was delivered or is still being tried.</p>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-rule bg-white p-3">
          <table className="w-full min-w-[40rem] text-left text-sm">
            <thead className="text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                <th className="pb-2">Subject</th>
                <th className="pb-2">For</th>
                <th className="pb-2">Last try</th>
                <th className="pb-2">Last error</th>
                <th className="pb-2" />
              </tr>
            </thead>
            <tbody>
              {items.map((m) => (
                <tr key={m.id} className="border-t border-rule align-top">
                  <td className="py-2 pr-3">{m.subject}</td>
                  <td className="py-2 pr-3">{m.recipientLogin ?? <span className="text-ink-soft">no account</span>}</td>
                  <td className="num py-2 pr-3">{formatDateTime(m.lastAttemptAt)}</td>
                  <td className="max-w-[20rem] break-words py-2 pr-3 text-xs text-ink-soft">{m.lastError ?? '—'}</td>
                  <td className="py-2 text-right">
                    <Button
                      variant="secondary"
                      disabled={requeue.isPending && requeue.variables === m.id}
                      onClick={() => requeue.mutate(m.id)}
                      aria-label={`Send "${m.subject}" again`}
                    >
                      Send again
                    </Button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          {mails.data!.total > items.length && (
            <p className="mt-2 text-xs text-ink-soft">
              Showing the newest {items.length} of {mails.data!.total}.
            </p>
          )}
        </div>
      )}
    </section>
  );
}
