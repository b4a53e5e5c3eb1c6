import { useState } from 'react';
import type { CreatedApiTokenDto } from '@shared/schemas/api-token.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';

type CopyState = 'idle' | 'copied' | 'failed';

/** The new token's secret, this once: a copy button, a plain warning, and a button to put it away. */
export function NewTokenSecret({ token, onDone }: { token: CreatedApiTokenDto; onDone: () => void }) {
  const [copy, setCopy] = useState<CopyState>('idle');
  const handleCopy = () => {
    navigator.clipboard.writeText(token.token).then(
      () => setCopy('copied'),
      () => setCopy('failed'),
    );
  };
  return (
    <section aria-label={`Secret of ${token.name}`} className="space-y-3 rounded-md border border-teal/50 bg-teal/5 p-3">
      <Notice tone="caution" title="Copy it now: it will not be shown again">
        <p>
          Scanwright keeps only a fingerprint of this token, so nobody — us included — can show it to you later. Anyone holding it can act
          as you within its scopes: keep it in your rig’s configuration, not in a shared notebook or a public repository. If it leaks,
          revoke it below and make a new one.
        </p>
      </Notice>
      <div className="flex flex-wrap items-center gap-2">
        <code
          data-testid="new-token-secret"
          className="min-w-0 grow break-all rounded border border-rule bg-white px-2 py-1.5 font-mono text-sm"
        >
          {token.token}
        </code>
        <Button variant="secondary" onClick={handleCopy}>
          Copy
        </Button>
      </div>
      <p role="status" className="min-h-5 text-sm">
        {copy === 'copied'
          ? 'Copied to the clipboard.'
          : copy === 'failed'
            ? 'The browser would not copy; select the token and copy it by hand.'
            : ''}
      </p>
      <Button variant="ghost" onClick={onDone}>
        I have stored it
      </Button>
    </section>
  );
}
