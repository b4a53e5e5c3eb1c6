import { useId, useState } from 'react';
import type { CreatedApiTokenDto } from '@shared/schemas/api-token.ts';
import { useApiTokens } from '@/features/account/api/get-api-tokens.ts';
import { NewTokenForm } from './new-token-form.tsx';
import { NewTokenSecret } from './new-token-secret.tsx';
import { TokenList } from './token-list.tsx';

/** "Rig tokens": personal API tokens for scripts that post runs straight from a measuring rig. */
export function RigTokens() {
  const id = useId();
  const tokens = useApiTokens();
  const [created, setCreated] = useState<CreatedApiTokenDto | null>(null);
  return (
    <section aria-labelledby={`${id}-title`} className="mt-6 max-w-2xl space-y-4 rounded-lg border border-rule bg-white p-5">
      <div>
        <h2 id={`${id}-title`} className="text-lg font-semibold">
          Rig tokens
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          A token lets a script on your bench computer add calibration runs to your actuators without a browser: send it as{' '}
          <code className="whitespace-nowrap">Authorization: Bearer …</code>. Give each rig its own token, so you can revoke one without
          touching the others.
        </p>
      </div>
      {created ? <NewTokenSecret token={created} onDone={() => setCreated(null)} /> : <NewTokenForm onCreated={setCreated} />}
      {tokens.isPending ? (
        <p role="status" className="text-sm text-ink-soft">
          Loading your tokens…
        </p>
      ) : tokens.isError ? (
        <p role="alert" className="text-sm text-danger">
          Your tokens did not load: {tokens.error.message}
        </p>
      ) : (
        <TokenList tokens={tokens.data} />
      )}
    </section>
  );
}
