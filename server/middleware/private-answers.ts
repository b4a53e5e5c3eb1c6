import type { RequestHandler } from 'express';
import { routePath } from './route-path.ts';

/** Routes whose answer is about whoever asks, even a visitor (the session's CSRF token, "you are not signed in"). */
const ALWAYS_PERSONAL = [
  /^\/api\/[a-z-]+\/mine$/,
  /^\/api\/session$/,
  /^\/api\/account(\/|$)/,
  /^\/api\/inbox(\/|$)/,
  /^\/api\/notifications(\/|$)/,
  /^\/auth(\/|$)/,
];

/**
 * `Cache-Control: no-store` on every answer that depends on who asks, so no browser cache or shared proxy keeps
 * one person's account, inbox, tokens, drafts or abilities and hands them to the next: every /api and /auth answer
 * to a request carrying a session cookie or an `Authorization` header, and the per-person routes whoever asks.
 * A visitor's anonymous read is the same for everyone and keeps what its route says (the dataset's 5 minutes).
 * Set before the routes run, so a route may still choose otherwise for an answer that is the same for all.
 */
export function privateAnswers(sessionCookie: string): RequestHandler {
  const needle = `${sessionCookie}=`;
  return (req, res, next) => {
    const path = routePath(req);
    if (!path.startsWith('/api/') && path !== '/auth' && !path.startsWith('/auth/')) return next();
    const personal =
      (req.headers.cookie ?? '').includes(needle) || req.headers.authorization !== undefined || ALWAYS_PERSONAL.some((re) => re.test(path));
    if (personal) {
      res.set('Cache-Control', 'no-store');
      res.vary('Cookie');
      res.vary('Authorization');
    }
    next();
  };
}
