import { Router } from 'express';
import {
  acceptRejectInput,
  accountSettingsInput,
  auditQuery,
  buildDecisionInput,
  createReportInput,
  reportDecisionInput,
  reviewIdParams,
} from '@shared/schemas/review.ts';
import type { Config } from '../config.ts';
import { validate } from '../middleware/validate.ts';
import { limiter } from '../middleware/rate-limit.ts';
import { requireUser } from '../middleware/auth.ts';
import { actorOf } from '../middleware/actor.ts';
import { decideBuild, decidePart, decideReport, decideRun } from '../services/review.service.ts';
import { getReviewQueue } from '../services/review-queue.service.ts';
import { listAudit } from '../services/audit.service.ts';
import { createReport } from '../services/report.service.ts';
import { getAccountSettings, updateAccountSettings } from '../services/account.service.ts';

/** The review desk, reports, the audit trail and the mail setting. */
export function reviewRoutes(config: Config): Router {
  const r = Router();
  const reportLimit = limiter(config.rateLimits, { windowMs: 60 * 60_000, limit: 30, what: 'reports', perUser: true });
  const id = validate(reviewIdParams, 'params');
  r.get('/api/review/queue', requireUser, async (req, res) => {
    res.json(await getReviewQueue(actorOf(req)));
  });
  r.post('/api/review/builds/:id/decision', requireUser, id, validate(buildDecisionInput), async (req, res) => {
    res.json(await decideBuild(actorOf(req), res.locals.params.id, res.locals.body));
  });
  r.post('/api/review/runs/:id/decision', requireUser, id, validate(acceptRejectInput), async (req, res) => {
    res.json(await decideRun(actorOf(req), res.locals.params.id, res.locals.body));
  });
  r.post('/api/review/parts/:id/decision', requireUser, id, validate(acceptRejectInput), async (req, res) => {
    res.json(await decidePart(actorOf(req), res.locals.params.id, res.locals.body));
  });
  r.post('/api/review/reports/:id/decision', requireUser, id, validate(reportDecisionInput), async (req, res) => {
    res.json(await decideReport(actorOf(req), res.locals.params.id, res.locals.body));
  });
  r.get('/api/review/audit', requireUser, validate(auditQuery, 'query'), async (req, res) => {
    res.json(await listAudit(actorOf(req), res.locals.query));
  });
  r.post('/api/reports', requireUser, reportLimit, validate(createReportInput), async (req, res) => {
    res.status(201).json(await createReport(actorOf(req), res.locals.body));
  });
  r.get('/api/account/settings', requireUser, async (req, res) => {
    res.json(await getAccountSettings(actorOf(req)));
  });
  r.patch('/api/account/settings', requireUser, validate(accountSettingsInput), async (req, res) => {
    res.json(await updateAccountSettings(actorOf(req), res.locals.body));
  });
  return r;
}
