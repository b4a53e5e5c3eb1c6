import type { ApiTokenDto } from '@shared/schemas/api-token.ts';
import { formatDateTime } from '@shared/format/dates.ts';
import { ConfirmButton } from '@/components/ui/confirm-button.tsx';
import { useRevokeApiToken } from '@/features/account/api/revoke-api-token.ts';

/** The person's tokens with their scopes and dates, each revocable after a second click. */
export function TokenList({ tokens }: { tokens: ApiTokenDto[] }) {
  const revoke = useRevokeApiToken();
  if (tokens.length === 0) return <p className="text-sm text-ink-soft">No tokens yet.</p>;
  return (
    <>
      <ul aria-label="Your rig tokens" className="divide-y divide-rule rounded-md border border-rule">
        {tokens.map((t) => (
          <li key={t.id} className="flex flex-wrap items-center justify-between gap-3 p-3">
            <div className="min-w-0">
              <p className="font-medium break-words">{t.name}</p>
              <p className="text-xs text-ink-soft">
                {t.scopes.join(' · ')} · created {formatDateTime(t.createdAt)} ·{' '}
                {t.lastUsedAt ? `last used ${formatDateTime(t.lastUsedAt)}` : 'never used'}
              </p>
            </div>
            <ConfirmButton
              label="Revoke"
              ariaLabel={`Revoke ${t.name}`}
              question={`Revoke “${t.name}”? Scripts using it stop working at once.`}
              confirmLabel="Revoke token"
              disabled={revoke.isPending}
              onConfirm={() => revoke.mutate(t.id)}
            />
          </li>
        ))}
      </ul>
      {revoke.isError && (
        <p role="alert" className="mt-2 text-sm text-danger">
          Not revoked: {revoke.error.message}
        </p>
      )}
    </>
  );
}
