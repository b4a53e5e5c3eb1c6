import { useState } from 'react';
import { formatDate } from '@shared/format/dates.ts';
import { Button } from '@/components/ui/button.tsx';
import { useRevokeUserToken, useUserTokens } from '../api/user-tokens.ts';

/** An account's rig tokens behind a disclosure, each with a revoke button; revocations go on the audit trail. */
export function UserTokens({ userId, login }: { userId: number; login: string }) {
  const [open, setOpen] = useState(false);
  const tokens = useUserTokens(userId, open);
  const revoke = useRevokeUserToken();
  return (
    <details className="mt-1 text-left text-sm" onToggle={(e) => setOpen(e.currentTarget.open)}>
      <summary className="cursor-pointer text-ink-soft">Rig tokens</summary>
      {tokens.isPending && open && <p className="text-ink-soft">Loading…</p>}
      {tokens.isError && (
        <p role="alert" className="text-danger">
          {tokens.error.message}
        </p>
      )}
      {tokens.data?.length === 0 && <p className="text-ink-soft">No tokens.</p>}
      <ul className="space-y-1">
        {tokens.data?.map((tk) => (
          <li key={tk.id} className="flex items-center justify-between gap-2">
            <span>
              “{tk.name}”{' '}
              <span className="text-ink-soft">
                ({tk.scopes.join(', ')}; last used {formatDate(tk.lastUsedAt)})
              </span>
            </span>
            <Button
              variant="danger"
              disabled={revoke.isPending}
              aria-label={`Revoke ${login}’s token ${tk.name}`}
              onClick={() => revoke.mutate({ userId, tokenId: tk.id })}
            >
              Revoke
            </Button>
          </li>
        ))}
      </ul>
      {revoke.error && (
        <p role="alert" className="text-xs text-danger">
          {revoke.error.message}
        </p>
      )}
    </details>
  );
}
