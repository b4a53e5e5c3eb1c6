import type { RequestHandler } from 'express';
import { routePath } from './route-path.ts';

/**
 * Run `mw` except for reads that carry no session cookie: a visitor's GET of public data needs no
 * session, so the registry search and build pages skip creating one. /api/session and /auth/* always
 * get a session (they hand out the CSRF token and run sign-in), however the path is cased or ended (`routePath`).
 */
export function unlessAnonymousRead(cookieName: string, ...mws: RequestHandler[]): RequestHandler[] {
  const needle = `${cookieName}=`;
  const anonymousRead = (req: Parameters<RequestHandler>[0]) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || (req.headers.cookie ?? '').includes(needle)) return false;
    const path = routePath(req);
    return path !== '/api/session' && path !== '/auth' && !path.startsWith('/auth/');
  };
  return mws.map((mw) => (req, res, next) => (anonymousRead(req) ? next() : mw(req, res, next)));
}

/** Serve static files only outside /api, so API requests never touch the disk for a lookup. */
export function outsideApi(mw: RequestHandler): RequestHandler {
  return (req, res, next) => (routePath(req).startsWith('/api/') ? next() : mw(req, res, next));
}
