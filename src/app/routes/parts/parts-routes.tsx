import type { RouteObject } from 'react-router-dom';

/** Parts registry: the searchable table, the proposal form and each part's page, each its own chunk. */
export const partsRoutes: RouteObject = {
  path: 'parts',
  children: [
    { index: true, lazy: async () => ({ Component: (await import('./parts-index.tsx')).PartsIndexPage }) },
    { path: 'propose', lazy: async () => ({ Component: (await import('./propose-part.tsx')).ProposePartPage }) },
    { path: ':partId', lazy: async () => ({ Component: (await import('./part-page.tsx')).PartPage }) },
  ],
};
