// Route table rows (route-docs.ts): health, readiness, metrics and the API description.
import { json, type RouteDoc } from './route-doc.ts';

/** Health, readiness, metrics and the API description. */
export const serviceDocs: readonly RouteDoc[] = [
  {
    method: 'GET',
    path: '/api/health',
    summary: 'Is the service up (and its database reachable)',
    tag: 'Service',
    auth: 'visitor',
    response: json(200, 'Up.'),
    errors: [503],
  },
  {
    method: 'GET',
    path: '/api/ready',
    summary: 'Should this instance get traffic (readiness)',
    description:
      'Checks the database (`SELECT 1`), that migrations are current, that the uploads directory is writable with free space ' +
      'above `READY_MIN_FREE_MB`, and that fewer than `READY_MAX_OUTBOX` mails wait to be sent; answers are cached for a second. ' +
      '200 `{ status: "ready", checks }`; 503 `not_ready` naming the failed checks in `details.failed`, or `draining` while the ' +
      'instance shuts down. `/api/health` stays the cheap liveness check.',
    tag: 'Service',
    auth: 'visitor',
    response: json(200, 'Ready, with each check.'),
    errors: [503],
  },
  {
    method: 'GET',
    path: '/metrics',
    summary: 'Prometheus metrics (operators)',
    description:
      'Prometheus text format: requests by route pattern and status with latency histograms, database pool, outbox backlog and ' +
      'given-up mails, free space of the uploads disk, process memory and event-loop lag. Answered only on a loopback connection ' +
      'that no proxy forwarded, or with `Authorization: Bearer <METRICS_TOKEN>` when that is set; 404 otherwise.',
    tag: 'Service',
    auth: 'visitor',
    response: { status: 200, description: 'The metrics.', contentType: 'text/plain; version=0.0.4' },
    errors: [404],
  },
  {
    method: 'GET',
    path: '/api/openapi.json',
    summary: 'This OpenAPI 3.1 document',
    tag: 'Service',
    auth: 'visitor',
    response: json(200, 'The OpenAPI document.'),
  },
];
