import { createBrowserRouter } from 'react-router-dom';
import { AppShell } from './layout/app-shell.tsx';
import { RouteError } from '@/components/ui/route-error.tsx';
import { queryClient } from '@/lib/query-client.ts';
import { sessionQuery } from '@/features/session/api/get-session.ts';
import { workbenchRoutes } from './routes/workbench/workbench-routes.tsx';
import { buildsRoutes } from './routes/builds/builds-routes.tsx';
import { partsRoutes } from './routes/parts/parts-routes.tsx';
import { exchangeRoutes, inboxRoutes } from './routes/exchange/exchange-routes.tsx';
import { reviewRoutes } from './routes/review/review-routes.tsx';

/** Each page is its own chunk (route-level code splitting). */
export const router = createBrowserRouter([
  {
    path: '/',
    element: <AppShell />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <p className="p-6 text-ink-soft">Loading Scanwright…</p>,
    loader: () => queryClient.ensureQueryData(sessionQuery),
    children: [
      {
        errorElement: <RouteError />,
        children: [
          { index: true, lazy: async () => ({ Component: (await import('./routes/home.tsx')).HomePage }) },
          buildsRoutes,
          partsRoutes,
          exchangeRoutes,
          inboxRoutes,
          reviewRoutes,
          {
            path: 'account',
            lazy: async () => ({ Component: (await import('./routes/account/account-settings.tsx')).AccountSettingsPage }),
          },
          {
            path: 'notifications',
            lazy: async () => ({ Component: (await import('./routes/notifications.tsx')).NotificationsPage }),
          },
          {
            path: 'mail/stop/:userId/:kind/:token',
            lazy: async () => ({ Component: (await import('./routes/mail-stop.tsx')).MailStopPage }),
          },
          { path: 'admin', lazy: async () => ({ Component: (await import('./routes/admin/users.tsx')).AdminUsersPage }) },
          { path: 'api-reference', lazy: async () => ({ Component: (await import('./routes/api-reference.tsx')).ApiReferencePage }) },
          workbenchRoutes,
          { path: '*', lazy: async () => ({ Component: (await import('./routes/not-found.tsx')).NotFoundPage }) },
        ],
      },
    ],
  },
]);
