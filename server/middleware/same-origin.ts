import type { RequestHandler } from 'express';
import { ForbiddenError } from '../errors.ts';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

function originOfReferer(referer: string): string {
  try {
    return new URL(referer).origin;
  } catch {
    return 'invalid';
  }
}

/**
 * Refuse a state-changing request that a browser says comes from another site: its Origin header,
 * or when that is absent its Referer, must name our public origin. Requests carrying neither
 * (scripts, curl) pass here and still meet the CSRF check. No CORS headers are ever sent. `except`: paths whose
 * URL carries its own credential (the one-click unsubscribe link), which other sites' servers POST.
 */
export function requireSameOrigin(publicUrl: string, opts: { except?: RegExp[] } = {}): RequestHandler {
  const own = new URL(publicUrl).origin;
  const except = opts.except ?? [];
  return (req, _res, next) => {
    if (SAFE.has(req.method) || except.some((re) => re.test(req.path))) return next();
    const origin = req.get('origin');
    const referer = req.get('referer');
    const claimed = origin !== undefined ? origin : referer ? originOfReferer(referer) : undefined;
    if (claimed === undefined || claimed === own) return next();
    next(new ForbiddenError('Requests from other sites are refused.', 'cross_origin'));
  };
}
