// Route table rows (route-docs.ts): signing in and out and the session.
import { json, type RouteDoc } from './route-doc.ts';

/** Signing in and out and the session. */
export const sessionDocs: readonly RouteDoc[] = [
  {
    method: 'GET',
    path: '/api/session',
    summary: 'The signed-in user (or null) and the CSRF token for writes',
    description: 'Browsers only: a personal API token is refused here (403 `token_scope`).',
    tag: 'Session',
    auth: 'visitor',
    response: json(200, '`{ user, csrfToken }`.'),
  },
  {
    method: 'GET',
    path: '/auth/github',
    summary: 'Start signing in with GitHub',
    description: 'A browser redirect, not a JSON call. `returnTo` (a path) is where the browser lands afterwards.',
    tag: 'Session',
    auth: 'visitor',
    response: { status: 302, description: 'Redirect to GitHub.' },
    errors: [429],
  },
  {
    method: 'GET',
    path: '/auth/github/callback',
    summary: 'Where GitHub sends the browser back',
    tag: 'Session',
    auth: 'visitor',
    response: { status: 302, description: 'Redirect into the app, signed in.' },
  },
  {
    method: 'POST',
    path: '/auth/logout',
    summary: 'Sign out',
    description: 'Ends the signed-in session and starts an empty one, whose CSRF token the answer carries.',
    tag: 'Session',
    auth: 'session',
    response: json(200, '`{ user: null, csrfToken }`.'),
  },
];
