import { timingSafeEqual } from 'node:crypto';
import { Router, type Request } from 'express';
import type { Drain } from '../ops/drain.ts';
import type { Metrics } from '../ops/metrics.ts';
import type { Readiness } from '../ops/readiness.ts';

const LOOPBACK = new Set(['127.0.0.1', '::1', '::ffff:127.0.0.1']);

/**
 * /metrics is for the operator's scraper: a loopback connection that no proxy forwarded (a reverse proxy on
 * the same host connects from loopback too, so any forwarding header refuses), or anyone with
 * `Authorization: Bearer <METRICS_TOKEN>` when that is set. A wrong token refuses even on loopback.
 */
function mayScrape(req: Request, token: string | null): boolean {
  const auth = req.get('authorization');
  if (auth !== undefined) {
    if (!token || !auth.startsWith('Bearer ')) return false;
    const given = Buffer.from(auth.slice(7));
    const wanted = Buffer.from(token);
    return given.length === wanted.length && timingSafeEqual(given, wanted);
  }
  const forwarded = ['x-forwarded-for', 'forwarded', 'x-real-ip'].some((h) => req.headers[h] !== undefined);
  return !forwarded && LOOPBACK.has(req.socket.remoteAddress ?? '');
}

/** Readiness and metrics: outside sessions, CSRF and rate limits (mounted before them). */
export function opsRoutes(deps: {
  drain: Drain;
  readiness: { check(): Promise<Readiness> };
  metrics: Metrics;
  metricsToken: string | null;
}): Router {
  const r = Router();
  r.get('/api/ready', async (_req, res) => {
    res.set('Cache-Control', 'no-store');
    if (deps.drain.draining) {
      return void res.status(503).json({ error: { code: 'draining', message: 'This instance is shutting down.' } });
    }
    const { ok, failed, checks } = await deps.readiness.check();
    if (ok) return void res.json({ status: 'ready', checks });
    res.status(503).json({ error: { code: 'not_ready', message: `Not ready: ${failed.join(', ')}.`, details: { failed, checks } } });
  });
  r.get('/metrics', async (req, res) => {
    // Not found, like any path that is not there: the answer does not say whether metrics exist.
    if (!mayScrape(req, deps.metricsToken)) return void res.status(404).type('text/plain').send('Not Found');
    res
      .set('Cache-Control', 'no-store')
      .type(deps.metrics.registry.contentType)
      .send(await deps.metrics.registry.metrics());
  });
  return r;
}
