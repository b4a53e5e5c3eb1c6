import { Router } from 'express';
import {
  acceptRejectInput,
  auditQuery,
  buildDecisionInput,
  createReportInput,
  reportDecisionInput,
  reviewIdParams,
} from '@shared/schemas/review.ts';
import type { Config } from '../config.ts';
import { limiter } from '../middleware/rate-limit.ts';
import { requireUser } from '../middleware/auth.ts';
import { decideBuild, decidePart, decideReport, decideRun } from '../services/review.service.ts';
import { getReviewQueue } from '../services/review-queue.service.ts';
import { listAudit } from '../services/audit.service.ts';
import { createReport } from '../services/report.service.ts';
import { publishWithRunsInput, reviewBuildParams, reviewRunParams, runPointsQuery } from '@shared/schemas/review-desk.ts';
import { getReviewBuildRuns, publishBuildWithRuns } from '../services/review-build.service.ts';
import { getRunPointsPage } from '../services/review-points.service.ts';
import { getReviewHistory } from '../services/review-history.service.ts';
import { route } from './route.ts';

/** The review desk, reports and the audit trail. */
export function reviewRoutes(config: Config): Router {
  const r = Router();
  const reportLimit = limiter(config, { windowMs: 60 * 60_000, limit: 30, what: 'reports', perUser: true });
  r.get(
    '/api/review/queue',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json(await getReviewQueue(actor));
    }),
  );
  r.post(
    '/api/review/builds/:id/decision',
    requireUser,
    route({ params: reviewIdParams, body: buildDecisionInput }, async ({ actor, params, body, res }) => {
      res.json(await decideBuild(actor, params.id, body));
    }),
  );
  r.get(
    '/api/review/builds/:buildId/runs',
    requireUser,
    route({ params: reviewBuildParams }, async ({ actor, params, res }) => {
      res.json(await getReviewBuildRuns(actor, params.buildId));
    }),
  );
  r.get(
    '/api/review/builds/:buildId/history',
    requireUser,
    route({ params: reviewBuildParams }, async ({ actor, params, res }) => {
      res.json(await getReviewHistory(actor, params.buildId));
    }),
  );
  r.post(
    '/api/review/builds/:buildId/publish-with-runs',
    requireUser,
    route({ params: reviewBuildParams, body: publishWithRunsInput }, async ({ actor, params, body, res }) => {
      res.json(await publishBuildWithRuns(actor, params.buildId, body));
    }),
  );
  r.get(
    '/api/review/runs/:runId/points',
    requireUser,
    route({ params: reviewRunParams, query: runPointsQuery }, async ({ actor, params, query, res }) => {
      res.json(await getRunPointsPage(actor, params.runId, query));
    }),
  );
  r.post(
    '/api/review/runs/:id/decision',
    requireUser,
    route({ params: reviewIdParams, body: acceptRejectInput }, async ({ actor, params, body, res }) => {
      res.json(await decideRun(actor, params.id, body));
    }),
  );
  r.post(
    '/api/review/parts/:id/decision',
    requireUser,
    route({ params: reviewIdParams, body: acceptRejectInput }, async ({ actor, params, body, res }) => {
      res.json(await decidePart(actor, params.id, body));
    }),
  );
  r.post(
    '/api/review/reports/:id/decision',
    requireUser,
    route({ params: reviewIdParams, body: reportDecisionInput }, async ({ actor, params, body, res }) => {
      res.json(await decideReport(actor, params.id, body));
    }),
  );
  r.get(
    '/api/review/audit',
    requireUser,
    route({ query: auditQuery }, async ({ actor, query, res }) => {
      res.json(await listAudit(actor, query));
    }),
  );
  r.post(
    '/api/reports',
    requireUser,
    reportLimit,
    route({ body: createReportInput }, async ({ actor, body, res }) => {
      res.status(201).json(await createReport(actor, body));
    }),
  );
  return r;
}
