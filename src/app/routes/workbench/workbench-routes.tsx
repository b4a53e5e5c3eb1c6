import type { RouteObject } from 'react-router-dom';

/** The workbench section: an index of calculators, one lazily loaded page each. */
export const workbenchRoutes: RouteObject = {
  path: 'workbench',
  children: [
    { index: true, lazy: async () => ({ Component: (await import('./workbench-index.tsx')).WorkbenchIndexPage }) },
  ],
};
