import { rateLimit } from 'express-rate-limit';
import type { Request, RequestHandler } from 'express';

/** A per-client limiter answering 429 in the error shape; a no-op when limits are switched off (benchmarks, most tests). */
export function limiter(
  enabled: boolean,
  opts: {
    windowMs: number;
    limit: number;
    what: string;
    perUser?: boolean;
    /** Count per this key instead of per address (an API token's id). */
    keyOf?: (req: Request) => string;
    skip?: (req: Request) => boolean;
  },
): RequestHandler {
  if (!enabled) return (_req, _res, next) => next();
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    ...(opts.skip ? { skip: opts.skip } : {}),
    ...(opts.perUser ? { keyGenerator: (req: Request) => `user:${(req.user as { id?: number } | undefined)?.id ?? 'anon'}` } : {}),
    ...(opts.keyOf ? { keyGenerator: opts.keyOf } : {}),
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate_limited', message: `Too many ${opts.what}; wait a little and try again.` } });
    },
  });
}
