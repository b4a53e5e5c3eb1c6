import { useIsFetching } from '@tanstack/react-query';

/** The thin copper bar along the top of the window. It fades in only after a short delay (index.css). */
export function ProgressBar() {
  return (
    <div className="pointer-events-none fixed inset-x-0 top-0 z-50 h-[3px]" role="progressbar" aria-label="Loading the page">
      <div className="sw-route-progress h-full bg-copper" />
    </div>
  );
}

/**
 * The bar while a page's first data loads; while its code (a lazy page) loads, the page's own Suspense fallback
 * shows the same bar (lazy-page.tsx). Refetches of data already on screen do not count, and quick changes show
 * nothing.
 */
export function RouteProgress() {
  const firstLoads = useIsFetching({ predicate: (q) => q.state.data === undefined });
  return firstLoads === 0 ? null : <ProgressBar />;
}
