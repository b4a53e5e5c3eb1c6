import { rateLimit } from 'express-rate-limit';
import type { Request, RequestHandler } from 'express';
import type { Config } from '../config.ts';
import { MariaDbRateLimitStore } from './rate-limit-store.ts';

/** Whether limits apply, and where their counts live. */
export type RateLimitSettings = Pick<Config, 'rateLimits' | 'rateLimitStore'>;

/**
 * A per-client limiter answering 429 in the error shape; a no-op when limits are switched off (benchmarks, most tests).
 * Counts are kept in this process, or in MariaDB when several instances must share them (`rateLimitStore`).
 */
export function limiter(
  settings: RateLimitSettings,
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
  if (!settings.rateLimits) return (_req, _res, next) => next();
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    ...(settings.rateLimitStore === 'mariadb' ? { store: new MariaDbRateLimitStore(opts.what) } : {}),
    ...(opts.skip ? { skip: opts.skip } : {}),
    ...(opts.perUser ? { keyGenerator: (req: Request) => `user:${(req.user as { id?: number } | undefined)?.id ?? 'anon'}` } : {}),
    ...(opts.keyOf ? { keyGenerator: opts.keyOf } : {}),
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate_limited', message: `Too many ${opts.what}; wait a little and try again.` } });
    },
  });
}
