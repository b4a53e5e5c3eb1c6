import type { RouteObject } from 'react-router-dom';
import { lazyPage } from '../../lazy-page.tsx';

/** Exchange: listings, a listing's page, the listing form and my listings, each its own chunk. */
export const exchangeRoutes: RouteObject = {
  path: 'exchange',
  children: [
    {
      index: true,
      element: lazyPage(
        () => import('./exchange-index.tsx'),
        (m) => m.ExchangeIndexPage,
      ),
    },
    {
      path: 'new',
      element: lazyPage(
        () => import('./listing-new.tsx'),
        (m) => m.ListingNewPage,
      ),
    },
    {
      path: 'mine',
      element: lazyPage(
        () => import('./my-listings.tsx'),
        (m) => m.MyListingsPage,
      ),
    },
    {
      path: ':listingId',
      element: lazyPage(
        () => import('./listing-page.tsx'),
        (m) => m.ListingPage,
      ),
    },
    {
      path: ':listingId/edit',
      element: lazyPage(
        () => import('./listing-edit.tsx'),
        (m) => m.ListingEditPage,
      ),
    },
  ],
};

/** The inbox: conversations about listings, and one conversation. */
export const inboxRoutes: RouteObject = {
  path: 'inbox',
  children: [
    {
      index: true,
      element: lazyPage(
        () => import('./inbox.tsx'),
        (m) => m.InboxPage,
      ),
    },
    {
      path: ':threadId',
      element: lazyPage(
        () => import('./inbox-thread.tsx'),
        (m) => m.InboxThreadPage,
      ),
    },
  ],
};
