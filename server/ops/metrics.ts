// Prometheus metrics (prom-client), one registry per app so tests can build several apps in one process.
// Request labels use the Express route pattern (`/api/builds/:buildId`), never the raw URL, so the
// number of series stays bounded whatever clients ask for.
import type { Request, RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { Counter, Gauge, Histogram, Registry, collectDefaultMetrics } from 'prom-client';
import { outboxStats } from '../services/outbox-admin.service.ts';
import { freeBytes } from './disk-space.ts';

export interface Metrics {
  registry: Registry;
  /** Registered first: times every request and counts it by method, route pattern and status. */
  middleware: RequestHandler;
  /** One mail given up by this instance's outbox worker. */
  mailGivenUp(): void;
}

/** sequelize-pool's counters (Sequelize 6 keeps its pool at connectionManager.pool). */
interface PoolCounters {
  size: number;
  available: number;
  using: number;
  waiting: number;
  maxSize: number;
}

/** The route pattern that answered, or a fixed label for what no route handled (static files, unknown paths). */
function routeLabel(req: Request): string {
  const path = (req.route as { path?: unknown } | undefined)?.path;
  if (path !== undefined) return `${req.baseUrl}${String(path)}`;
  const url = req.originalUrl;
  if (url.startsWith('/assets/')) return '/assets/*';
  if (url.startsWith('/uploads/')) return '/uploads/*';
  return '(unmatched)';
}

export function createMetrics(deps: { sequelize: Sequelize; uploadsDir: string }): Metrics {
  const registry = new Registry();
  // Process memory, CPU, event-loop lag (nodejs_eventloop_lag_*), handles and GC.
  collectDefaultMetrics({ register: registry });

  const requests = new Counter({
    name: 'scanwright_http_requests_total',
    help: 'HTTP requests answered, by method, route pattern and status.',
    labelNames: ['method', 'route', 'status'] as const,
    registers: [registry],
  });
  const latency = new Histogram({
    name: 'scanwright_http_request_duration_seconds',
    help: 'Time from request to the end of the response, by method, route pattern and status.',
    labelNames: ['method', 'route', 'status'] as const,
    buckets: [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10],
    registers: [registry],
  });

  const pool = () => (deps.sequelize.connectionManager as unknown as { pool?: PoolCounters }).pool;
  new Gauge({
    name: 'scanwright_db_pool_connections',
    help: 'Database pool connections by state: in use, idle, and requests waiting for one.',
    labelNames: ['state'] as const,
    registers: [registry],
    collect() {
      const p = pool();
      this.set({ state: 'in_use' }, p?.using ?? 0);
      this.set({ state: 'idle' }, p?.available ?? 0);
      this.set({ state: 'waiting' }, p?.waiting ?? 0);
    },
  });
  new Gauge({
    name: 'scanwright_db_pool_max_connections',
    help: 'Largest size of the database pool.',
    registers: [registry],
    collect() {
      this.set(pool()?.maxSize ?? 0);
    },
  });

  // The three outbox gauges share one query per scrape.
  let stats: ReturnType<typeof outboxStats> | null = null;
  // A database that does not answer shows as NaN rather than failing the whole scrape.
  const unknown = { backlog: NaN, oldestAgeS: NaN, givenUp: NaN };
  const outbox = () =>
    (stats ??= outboxStats(deps.sequelize)
      .catch(() => unknown)
      .finally(() => setImmediate(() => (stats = null))));
  new Gauge({
    name: 'scanwright_outbox_backlog',
    help: 'Unsent mails still being tried.',
    registers: [registry],
    async collect() {
      this.set((await outbox()).backlog);
    },
  });
  new Gauge({
    name: 'scanwright_outbox_oldest_unsent_age_seconds',
    help: 'Age of the oldest unsent mail still being tried (0 when none).',
    registers: [registry],
    async collect() {
      this.set((await outbox()).oldestAgeS);
    },
  });
  new Gauge({
    name: 'scanwright_outbox_given_up',
    help: 'Unsent mails given up after the last attempt, waiting for an admin to re-queue them.',
    registers: [registry],
    async collect() {
      this.set((await outbox()).givenUp);
    },
  });
  const givenUp = new Counter({
    name: 'scanwright_outbox_given_up_total',
    help: 'Mails this instance gave up on since it started.',
    registers: [registry],
  });
  new Gauge({
    name: 'scanwright_uploads_free_bytes',
    help: 'Free space an unprivileged writer has on the file system of the uploads directory.',
    registers: [registry],
    async collect() {
      this.set(await freeBytes(deps.uploadsDir).catch(() => NaN));
    },
  });

  return {
    registry,
    mailGivenUp: () => givenUp.inc(),
    middleware(req, res, next) {
      const end = latency.startTimer();
      res.once('finish', () => {
        const labels = { method: req.method, route: routeLabel(req), status: String(res.statusCode) };
        end(labels);
        requests.inc(labels);
      });
      next();
    },
  };
}
