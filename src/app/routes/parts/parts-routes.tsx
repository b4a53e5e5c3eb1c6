import type { RouteObject } from 'react-router-dom';
import { lazyPage } from '../../lazy-page.tsx';

/** Parts registry: the searchable table, the proposal form and each part's page, each its own chunk. */
export const partsRoutes: RouteObject = {
  path: 'parts',
  children: [
    {
      index: true,
      element: lazyPage(
        () => import('./parts-index.tsx'),
        (m) => m.PartsIndexPage,
      ),
    },
    {
      path: 'propose',
      element: lazyPage(
        () => import('./propose-part.tsx'),
        (m) => m.ProposePartPage,
      ),
    },
    {
      path: ':partId',
      element: lazyPage(
        () => import('./part-page.tsx'),
        (m) => m.PartPage,
      ),
    },
  ],
};
