import type { Request } from 'express';

/**
 * The path as the router matches it: Express routes are case-insensitive and ignore one trailing slash
 * (`caseSensitive` and `strict` off), so `/API/Session/` reaches the `/api/session` route. Middleware that
 * decides by path must compare this form, or it and the router disagree about which route a request is.
 */
export function routePath(req: Pick<Request, 'path'>): string {
  const lower = req.path.toLowerCase();
  return lower.length > 1 && lower.endsWith('/') ? lower.slice(0, -1) : lower;
}
