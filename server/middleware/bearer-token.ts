import type { Request, RequestHandler } from 'express';
import type { TokenScope } from '@shared/schemas/api-token.ts';
import { tokenMayRequest } from '@shared/auth/token-scopes.ts';
import { AppError, ForbiddenError } from '../errors.ts';
import { authenticateApiToken } from '../services/api-token.service.ts';
import { limiter, type RateLimitSettings } from './rate-limit.ts';
import { routePath } from './route-path.ts';

declare module 'express-serve-static-core' {
  interface Request {
    /** Set when the request came with a valid personal API token (`Authorization: Bearer …`). */
    apiToken?: { id: number; scopes: TokenScope[] };
  }
}

const BEARER = /^Bearer +([^\s]+) *$/i;

const invalidToken = () =>
  new AppError(401, 'invalid_token', 'The API token is wrong, revoked, or its account is suspended; make a new one on your account page.');

/**
 * Requests carrying `Authorization` are a rig's, not a browser's: the token must be valid (else 401,
 * never a visitor's answer), it counts against its own rate limit, and it reaches only what its
 * scopes allow (`shared/auth/token-scopes.ts`, else 403 `token_scope`). The request then acts as the
 * token's owner; the session and CSRF middleware skip it (`unlessBearer`).
 */
export function bearerToken(rateLimits: RateLimitSettings): RequestHandler[] {
  const authenticate: RequestHandler = async (req, res, next) => {
    const header = req.headers.authorization;
    if (header === undefined) return next();
    const secret = BEARER.exec(header)?.[1];
    const found = secret ? await authenticateApiToken(secret) : null;
    if (!found) {
      res.set('WWW-Authenticate', 'Bearer error="invalid_token"');
      throw invalidToken();
    }
    req.apiToken = { id: found.tokenId, scopes: found.scopes };
    req.user = found.user;
    next();
  };
  const perToken = limiter(rateLimits, {
    windowMs: 60_000,
    limit: 120,
    what: 'requests with this API token',
    keyOf: (req) => `token:${req.apiToken?.id}`,
    skip: (req) => !req.apiToken,
  });
  const withinScopes: RequestHandler = (req, _res, next) => {
    if (!req.apiToken || tokenMayRequest(req.apiToken.scopes, req.method, routePath(req))) return next();
    next(
      new ForbiddenError(
        `This API token's scopes (${req.apiToken.scopes.join(', ')}) do not allow ${req.method} ${req.path}; token management needs a browser session.`,
        'token_scope',
      ),
    );
  };
  return [authenticate, perToken, withinScopes];
}

/** Run `mw` only for requests without an API token (the session, passport and CSRF middleware). */
export const unlessBearer =
  (mw: RequestHandler): RequestHandler =>
  (req: Request, res, next) =>
    req.apiToken ? next() : mw(req, res, next);
