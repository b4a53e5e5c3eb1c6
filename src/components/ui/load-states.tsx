import type { ReactNode } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { AnchorButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
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

/** What a page shows a visitor where it needs a signed-in maker: why, and a sign-in button that comes back here. */
export function SignInFirst({ title }: { title: string }) {
  const location = useLocation();
  return (
    <Notice title={title}>
      <p>
        <AnchorButton href={paths.signIn(location.pathname)}>Sign in</AnchorButton>
      </p>
    </Notice>
  );
}

/** A dashed box for an empty list: what is missing, and what to do about it. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-rule bg-white p-6 text-center">
      <p className="font-medium">{title}</p>
      {children}
    </div>
  );
}

/** A query's three states on a page: loading, failed (with retry) or its data, handed to `children`. */
export function QueryBlock<T>({
  query,
  loading,
  what,
  children,
}: {
  query: { isPending: boolean; isError: boolean; error: Error | null; data: T | undefined; refetch: () => unknown };
  loading: string;
  what: string;
  children: (data: T) => ReactNode;
}) {
  if (query.isPending) return <Loading>{loading}</Loading>;
  if (query.isError || query.data === undefined)
    return <LoadError what={what} error={query.error ?? new Error('No data.')} onRetry={() => void query.refetch()} />;
  return <>{children(query.data)}</>;
}
