import type { Request, RequestHandler } from 'express';
import { limiter, type RateLimitSettings } from './rate-limit.ts';

/** A body over this many bytes (as parsed, after any Content-Encoding is undone) is a large one. */
const LARGE_BYTES = 1_000_000;

const inflatedSizes = new WeakMap<Request, number>();

/** Called by the JSON parser with the body as it will be parsed (inflated): remember its size for the limits. */
export function noteBodySize(req: Request, bytes: number): void {
  inflatedSizes.set(req, bytes);
}

const encoded = (req: Request) => (req.headers['content-encoding'] ?? 'identity').trim().toLowerCase() !== 'identity';

/**
 * The workbench's limit on large bodies (10 a minute per address), counted on the size the calculation reads:
 * a plain body by its Content-Length before it is read (no length: counted), a gzip, deflate or br body by its
 * inflated size once the parser has inflated it — a 10 kB gzip body can inflate to 32 MB. One counter for both.
 */
export function largeBodyLimit(settings: RateLimitSettings): { beforeBody: RequestHandler; afterBody: RequestHandler } {
  const large = (req: Request) =>
    encoded(req) ? (inflatedSizes.get(req) ?? 0) > LARGE_BYTES : Number(req.headers['content-length'] ?? Infinity) > LARGE_BYTES;
  const limit = limiter(settings, {
    windowMs: 60_000,
    limit: 10,
    what: 'large workbench calculations (over 1 MB)',
    skip: (req) => req.method !== 'POST' || !large(req),
  });
  return {
    beforeBody: (req, res, next) => (encoded(req) ? next() : limit(req, res, next)),
    afterBody: (req, res, next) => (encoded(req) ? limit(req, res, next) : next()),
  };
}
