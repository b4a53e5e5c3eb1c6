import { lazy, Suspense, type ComponentType, type ReactElement } from 'react';
import { ProgressBar } from './layout/route-progress.tsx';

let pages = 0;

/**
 * A page that is its own chunk, loaded on its first visit. Each page has a Suspense boundary with a key of its own,
 * so a navigation to it mounts a new boundary and the thin progress bar shows while its code arrives (React keeps
 * an already visible boundary's old content during a transition and would show nothing).
 */
export function lazyPage<M>(load: () => Promise<M>, pick: (module: M) => ComponentType): ReactElement {
  const Page = lazy(async () => ({ default: pick(await load()) }));
  return (
    <Suspense key={`page-${++pages}`} fallback={<ProgressBar />}>
      <Page />
    </Suspense>
  );
}
