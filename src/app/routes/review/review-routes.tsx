import type { RouteObject } from 'react-router-dom';

/** The review desk and its audit trail, each its own chunk. */
export const reviewRoutes: RouteObject = {
  path: 'review',
  children: [
    { index: true, lazy: async () => ({ Component: (await import('./review-desk.tsx')).ReviewDeskPage }) },
    { path: 'audit', lazy: async () => ({ Component: (await import('./review-audit.tsx')).ReviewAuditPage }) },
  ],
};
