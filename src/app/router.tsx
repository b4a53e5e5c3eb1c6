import { useRoutes, type RouteObject } from 'react-router-dom';
import { AppShell } from './layout/app-shell.tsx';
import { SessionGate } from './layout/session-gate.tsx';
import { lazyPage } from './lazy-page.tsx';
import { workbenchRoutes } from './routes/workbench/workbench-routes.tsx';
import { buildsRoutes } from './routes/builds/builds-routes.tsx';
import { partsRoutes } from './routes/parts/parts-routes.tsx';
import { exchangeRoutes, inboxRoutes } from './routes/exchange/exchange-routes.tsx';
import { reviewRoutes } from './routes/review/review-routes.tsx';

/**
 * Each page is its own chunk (route-level code splitting). Declarative routes (`useRoutes` under a `BrowserRouter`):
 * the app loads its data with TanStack Query, not route loaders, and this mode is about 15 KB (compressed) lighter
 * on every first load than the data router.
 */
const routes: RouteObject[] = [
  {
    path: '/',
    element: (
      <SessionGate>
        <AppShell />
      </SessionGate>
    ),
    children: [
      {
        index: true,
        element: lazyPage(
          () => import('./routes/home.tsx'),
          (m) => m.HomePage,
        ),
      },
      buildsRoutes,
      partsRoutes,
      exchangeRoutes,
      inboxRoutes,
      reviewRoutes,
      {
        path: 'account',
        element: lazyPage(
          () => import('./routes/account/account-settings.tsx'),
          (m) => m.AccountSettingsPage,
        ),
      },
      {
        path: 'notifications',
        element: lazyPage(
          () => import('./routes/notifications.tsx'),
          (m) => m.NotificationsPage,
        ),
      },
      {
        path: 'mail/stop/:userId/:kind/:token',
        element: lazyPage(
          () => import('./routes/mail-stop.tsx'),
          (m) => m.MailStopPage,
        ),
      },
      {
        path: 'admin',
        element: lazyPage(
          () => import('./routes/admin/users.tsx'),
          (m) => m.AdminUsersPage,
        ),
      },
      {
        path: 'api-reference',
        element: lazyPage(
          () => import('./routes/api-reference.tsx'),
          (m) => m.ApiReferencePage,
        ),
      },
      workbenchRoutes,
      {
        path: '*',
        element: lazyPage(
          () => import('./routes/not-found.tsx'),
          (m) => m.NotFoundPage,
        ),
      },
    ],
  },
];

export function AppRoutes() {
  return useRoutes(routes);
}
