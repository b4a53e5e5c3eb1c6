import { useId } from 'react';
import { useAccountSettings } from '@/features/account/api/get-account-settings.ts';
import { useUpdateAccountSettings } from '@/features/account/api/update-account-settings.ts';

/**
 * The one mail setting: non-essential mail on or off (the inverse of `mailOptOut`), saved as soon
 * as it is switched. Decisions on one's builds are always sent.
 */
export function MailSettings() {
  const settings = useAccountSettings(true);
  const update = useUpdateAccountSettings();
  const id = useId();

  if (settings.isPending)
    return (
      <p role="status" className="text-ink-soft">
        Loading your settings…
      </p>
    );
  if (settings.isError)
    return (
      <p role="alert" className="text-danger">
        Your settings did not load: {settings.error.message}
      </p>
    );

  const wanted = update.isPending && update.variables ? !update.variables.mailOptOut : !settings.data.mailOptOut;
  return (
    <section aria-labelledby={`${id}-title`} className="max-w-2xl rounded-lg border border-rule bg-white p-5">
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        E-mail
      </h2>
      <p className="mt-1 text-sm text-ink-soft">
        {settings.data.email ? (
          <>
            Mail goes to <span className="font-medium text-ink">{settings.data.email}</span>, the address your GitHub account gave us.
          </>
        ) : (
          'We have no e-mail address for you, so nothing is sent.'
        )}
      </p>
      <div className="mt-4 flex items-start gap-3">
        <input
          id={id}
          type="checkbox"
          role="switch"
          checked={wanted}
          disabled={update.isPending}
          aria-describedby={`${id}-what`}
          onChange={(e) => update.mutate({ mailOptOut: !e.target.checked })}
          className="mt-1 h-5 w-5 shrink-0 accent-copper"
        />
        <div>
          <label htmlFor={id} className="font-medium">
            Send me non-essential e-mail
          </label>
          <div id={`${id}-what`} className="mt-1 space-y-1 text-sm text-ink-soft">
            <p>
              Non-essential: decisions on your calibration runs and proposed parts, the outcome of reports you made, and the welcome note.
            </p>
            <p>
              Always sent, whatever you choose here: the review desk’s decisions on your builds (published, returned with notes, declined),
              because they may ask you to act.
            </p>
          </div>
        </div>
      </div>
      <p role="status" className="mt-3 min-h-5 text-sm">
        {update.isPending ? (
          'Saving…'
        ) : update.isError ? (
          <span className="text-danger">Not saved: {update.error.message}</span>
        ) : update.isSuccess ? (
          <span className="text-teal-dark">Saved.</span>
        ) : (
          ''
        )}
      </p>
    </section>
  );
}
