import type { RouteObject } from 'react-router-dom';

/** Builds: the published index, my builds, the editor and the build page, each its own chunk. */
export const buildsRoutes: RouteObject = {
  path: 'builds',
  children: [
    { index: true, lazy: async () => ({ Component: (await import('./builds-index.tsx')).BuildsIndexPage }) },
    { path: 'mine', lazy: async () => ({ Component: (await import('./my-builds.tsx')).MyBuildsPage }) },
    { path: 'new', lazy: async () => ({ Component: (await import('./build-new.tsx')).BuildNewPage }) },
    { path: ':buildId', lazy: async () => ({ Component: (await import('./build-page.tsx')).BuildPage }) },
    { path: ':buildId/edit', lazy: async () => ({ Component: (await import('./build-edit.tsx')).BuildEditPage }) },
  ],
};
