import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';

/** A quiet line saying what is being fetched; screen readers hear it once. */
export function Loading({ children }: { children: string }) {
  return (
    <p role="status" className="flex items-center gap-2 py-6 text-ink-soft">
      <span aria-hidden="true" className="h-3 w-3 animate-pulse rounded-full bg-teal/60" />
      {children}
    </p>
  );
}

/** What failed, the server's reason, and a way to try again. */
export function LoadError({ what, error, onRetry }: { what: string; error: Error; onRetry: () => void }) {
  return (
    <Notice tone="danger" title={`Could not load ${what}`}>
      <p>{error.message}</p>
      <p>
        <Button variant="secondary" onClick={onRetry}>
          Try again
        </Button>
      </p>
    </Notice>
  );
}

/** The page for a thing that is gone, hidden or never was: a title, why that may be, and ways back. */
export function NotFound({ title, reason, links }: { title: string; reason: ReactNode; links: readonly { to: string; label: string }[] }) {
  return (
    <div className="mx-auto max-w-xl py-12 text-center">
      <h1 className="text-xl font-semibold">{title}</h1>
      <p className="mt-2 text-ink-soft">{reason}</p>
      <p className="mt-6 flex justify-center gap-4">
        {links.map((l) => (
          <Link key={l.to} className="text-copper-dark underline" to={l.to}>
            {l.label}
          </Link>
        ))}
      </p>
    </div>
  );
}
