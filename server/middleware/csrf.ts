import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { ForbiddenError } from '../errors.ts';

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
    returnTo?: string;
  }
}

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);
/** Pure calculations that store nothing; visitors may call them without a session. */
const STATELESS = [/^\/api\/workbench\/[a-z-]+\/?$/i];

/** The session's CSRF token, made on first request for it. */
export function csrfTokenFor(req: Request): string {
  if (!req.session.csrfToken) req.session.csrfToken = randomBytes(24).toString('base64url');
  return req.session.csrfToken;
}

/** Compared as bytes: a header of the right length in characters can be longer in UTF-8 (Latin-1 bytes in a header). */
const same = (a: string, b: string) => {
  const [x, y] = [Buffer.from(a), Buffer.from(b)];
  return x.length === y.length && timingSafeEqual(x, y);
};

/** Every state-changing request under /api and /auth/logout must echo the token in X-CSRF-Token. */
export const requireCsrf: RequestHandler = (req, _res, next) => {
  if (SAFE.has(req.method)) return next();
  const fullPath = req.baseUrl + req.path;
  if (req.method === 'POST' && STATELESS.some((re) => re.test(fullPath))) return next();
  const sent = req.get('x-csrf-token') ?? '';
  const expected = req.session?.csrfToken;
  if (!expected || !sent || !same(sent, expected)) {
    return next(new ForbiddenError('Missing or wrong CSRF token; reload the page and try again.', 'csrf_failed'));
  }
  next();
};
