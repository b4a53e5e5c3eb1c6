import type { RouteObject } from 'react-router-dom';
import { lazyPage } from '../../lazy-page.tsx';

/** The review desk and its audit trail, each its own chunk. */
export const reviewRoutes: RouteObject = {
  path: 'review',
  children: [
    {
      index: true,
      element: lazyPage(
        () => import('./review-desk.tsx'),
        (m) => m.ReviewDeskPage,
      ),
    },
    {
      path: 'audit',
      element: lazyPage(
        () => import('./review-audit.tsx'),
        (m) => m.ReviewAuditPage,
      ),
    },
  ],
};
