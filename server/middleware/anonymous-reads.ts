import type { RequestHandler } from 'express';

/**
 * Run `mw` except for reads that carry no session cookie: a visitor's GET of public data needs no
 * session, so the registry search and build pages skip creating one. /api/session and /auth/* always
 * get a session (they hand out the CSRF token and run sign-in).
 */
export function unlessAnonymousRead(cookieName: string, ...mws: RequestHandler[]): RequestHandler[] {
  const needle = `${cookieName}=`;
  const anonymousRead = (req: Parameters<RequestHandler>[0]) =>
    (req.method === 'GET' || req.method === 'HEAD') &&
    !(req.headers.cookie ?? '').includes(needle) &&
    req.path !== '/api/session' &&
    !req.path.startsWith('/auth/');
  return mws.map((mw) => (req, res, next) => (anonymousRead(req) ? next() : mw(req, res, next)));
}

/** Serve static files only outside /api, so API requests never touch the disk for a lookup. */
export function outsideApi(mw: RequestHandler): RequestHandler {
  return (req, res, next) => (req.path.startsWith('/api/') ? next() : mw(req, res, next));
}
