import { useId } from 'react';
import { MAIL_KINDS, mailKindLabels } from '@shared/schemas/mail-choices.ts';
import { useAccountSettings, type AccountSettingsDto } from '@/features/account/api/get-account-settings.ts';
import { useUpdateAccountSettings } from '@/features/account/api/update-account-settings.ts';
import type { AccountSettingsInput } from '@shared/schemas/review.ts';

function Switch({
  id,
  checked,
  disabled,
  onChange,
  title,
  children,
}: {
  id: string;
  checked: boolean;
  disabled: boolean;
  onChange: (on: boolean) => void;
  title: string;
  children: React.ReactNode;
}) {
  return (
    <div className="flex items-start gap-3">
      <input
        id={id}
        type="checkbox"
        role="switch"
        checked={checked}
        disabled={disabled}
        aria-describedby={`${id}-what`}
        onChange={(e) => onChange(e.target.checked)}
        className="mt-1 h-5 w-5 shrink-0 accent-copper"
      />
      <div>
        <label htmlFor={id} className="font-medium">
          {title}
        </label>
        <div id={`${id}-what`} className="mt-1 space-y-1 text-sm text-ink-soft">
          {children}
        </div>
      </div>
    </div>
  );
}

/** What the settings will be once the pending change is saved (so switches do not flicker back). */
function shown(saved: AccountSettingsDto, pending: AccountSettingsInput | undefined): AccountSettingsDto {
  if (!pending) return saved;
  return {
    ...saved,
    mailOptOut: pending.mailOptOut ?? saved.mailOptOut,
    mailChoices: {
      ...saved.mailChoices,
      ...Object.fromEntries(Object.entries(pending.mailChoices ?? {}).filter(([, v]) => v !== undefined)),
    },
  };
}

/**
 * Mail choices, each saved as soon as it is switched: one switch per kind of mail (the same choice the
 * one-click link at the foot of every mail turns off), and the master switch for non-essential mail.
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

  const now = shown(settings.data, update.isPending ? update.variables : undefined);
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
        )}{' '}
        Everything below also shows on your notifications page, whatever you choose for mail.
      </p>
      <fieldset className="mt-4 space-y-4">
        <legend className="text-sm font-semibold">Which mail</legend>
        {MAIL_KINDS.map((kind) => (
          <Switch
            key={kind}
            id={`${id}-${kind}`}
            title={mailKindLabels[kind].title}
            checked={now.mailChoices[kind]}
            disabled={update.isPending}
            onChange={(on) => update.mutate({ mailChoices: { [kind]: on } })}
          >
            <p>{mailKindLabels[kind].what}</p>
          </Switch>
        ))}
      </fieldset>
      <div className="mt-6 border-t border-rule pt-4">
        <Switch
          id={id}
          title="Send me non-essential e-mail"
          checked={!now.mailOptOut}
          disabled={update.isPending}
          onChange={(on) => update.mutate({ mailOptOut: !on })}
        >
          <p>
            Off turns off everything above except the review desk’s decisions on your builds and your builds’ review threads, which may ask
            you to act, and messages about your listings.
          </p>
        </Switch>
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
