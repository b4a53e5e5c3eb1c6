// Graceful shutdown, the request side: once draining, /api/ready answers 503 and every response not yet
// started carries `Connection: close`, so keep-alive clients leave after their current request instead of
// sending more until the forced exit cuts them off (see server/index.ts for the order of the steps).
import type { RequestHandler, Response } from 'express';

export interface Drain {
  readonly draining: boolean;
  /** Start draining: answers from now on (and those of requests in flight) close their connection. */
  start(): void;
  /** Registered first: tracks responses in flight and marks new ones once draining. */
  middleware: RequestHandler;
}

export function createDrain(): Drain {
  let draining = false;
  const inFlight = new Set<Response>();
  return {
    get draining() {
      return draining;
    },
    start() {
      draining = true;
      for (const res of inFlight) if (!res.headersSent) res.setHeader('Connection', 'close');
    },
    middleware(_req, res, next) {
      if (draining) res.setHeader('Connection', 'close');
      else {
        inFlight.add(res);
        const done = () => inFlight.delete(res);
        res.once('finish', done);
        res.once('close', done);
      }
      next();
    },
  };
}
