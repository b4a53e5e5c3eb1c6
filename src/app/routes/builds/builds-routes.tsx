import type { RouteObject } from 'react-router-dom';
import { lazyPage } from '../../lazy-page.tsx';

/** Builds: the published index, my builds, the editor and the build page, each its own chunk. */
export const buildsRoutes: RouteObject = {
  path: 'builds',
  children: [
    {
      index: true,
      element: lazyPage(
        () => import('./builds-index.tsx'),
        (m) => m.BuildsIndexPage,
      ),
    },
    {
      path: 'mine',
      element: lazyPage(
        () => import('./my-builds.tsx'),
        (m) => m.MyBuildsPage,
      ),
    },
    {
      path: 'new',
      element: lazyPage(
        () => import('./build-new.tsx'),
        (m) => m.BuildNewPage,
      ),
    },
    {
      path: ':buildId',
      element: lazyPage(
        () => import('./build-page.tsx'),
        (m) => m.BuildPage,
      ),
    },
    {
      path: ':buildId/edit',
      element: lazyPage(
        () => import('./build-edit.tsx'),
        (m) => m.BuildEditPage,
      ),
    },
  ],
};
