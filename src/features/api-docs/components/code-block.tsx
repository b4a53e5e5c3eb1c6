import { useState } from 'react';
import { Button } from '@/components/ui/button.tsx';

/** A block of code or JSON with a copy button. */
export function CodeBlock({ code, label }: { code: string; label: string }) {
  const [copied, setCopied] = useState(false);
  async function copy() {
    await navigator.clipboard.writeText(code);
    setCopied(true);
    setTimeout(() => setCopied(false), 1500);
  }
  return (
    <figure className="overflow-hidden rounded-md border border-rule bg-paper-deep">
      <figcaption className="flex items-center justify-between gap-2 border-b border-rule px-3 py-1 text-xs text-ink-soft">
        <span>{label}</span>
        <Button variant="ghost" className="px-2 py-0.5 text-xs" onClick={() => void copy().catch(() => undefined)}>
          {copied ? 'Copied' : 'Copy'}
        </Button>
      </figcaption>
      <pre className="max-h-96 overflow-auto p-3 text-xs leading-relaxed">
        <code className="font-mono">{code}</code>
      </pre>
    </figure>
  );
}
