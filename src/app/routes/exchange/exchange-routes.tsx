import type { RouteObject } from 'react-router-dom';

/** Exchange: listings, a listing's page, the listing form and my listings, each its own chunk. */
export const exchangeRoutes: RouteObject = {
  path: 'exchange',
  children: [
    { index: true, lazy: async () => ({ Component: (await import('./exchange-index.tsx')).ExchangeIndexPage }) },
    { path: 'new', lazy: async () => ({ Component: (await import('./listing-new.tsx')).ListingNewPage }) },
    { path: 'mine', lazy: async () => ({ Component: (await import('./my-listings.tsx')).MyListingsPage }) },
    { path: ':listingId', lazy: async () => ({ Component: (await import('./listing-page.tsx')).ListingPage }) },
    { path: ':listingId/edit', lazy: async () => ({ Component: (await import('./listing-edit.tsx')).ListingEditPage }) },
  ],
};

/** The inbox: conversations about listings, and one conversation. */
export const inboxRoutes: RouteObject = {
  path: 'inbox',
  children: [
    { index: true, lazy: async () => ({ Component: (await import('./inbox.tsx')).InboxPage }) },
    { path: ':threadId', lazy: async () => ({ Component: (await import('./inbox-thread.tsx')).InboxThreadPage }) },
  ],
};
