import { useState } from 'react';
import { Button } from '@/components/ui/button.tsx';

/**
 * Copies the page's address, which holds its inputs, so the result can be shared; where the clipboard is
 * refused (an insecure origin, a denied permission) the address is shown to copy by hand.
 */
export function CopyLinkButton({ note }: { note?: string }) {
  const [state, setState] = useState<'idle' | 'copied' | 'manual'>('idle');
  const handleCopy = async () => {
    try {
      await navigator.clipboard.writeText(window.location.href);
      setState('copied');
    } catch {
      setState('manual');
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      <Button variant="secondary" onClick={() => void handleCopy()}>
        Copy link to this result
      </Button>
      <span role="status" className="text-ink-soft">
        {state === 'copied' ? 'Link copied.' : ''}
        {note ? ` The link keeps the inputs you typed; ${note}.` : ''}
      </span>
      {state === 'manual' && (
        <input
          readOnly
          aria-label="Link to this result"
          value={window.location.href}
          onFocus={(e) => e.target.select()}
          className="w-full rounded-md border border-rule bg-white px-2 py-1 text-xs"
        />
      )}
    </div>
  );
}
