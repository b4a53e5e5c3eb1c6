import { Router } from 'express';
import { buildIdParams } from '@shared/schemas/build.ts';
import { createReviewPostInput } from '@shared/schemas/review-thread.ts';
import type { Config } from '../config.ts';
import { limiter } from '../middleware/rate-limit.ts';
import { requireUser } from '../middleware/auth.ts';
import { getReviewThread, postToReviewThread } from '../services/review-thread.service.ts';
import { route } from './route.ts';

/** A build's review thread: its maker and the moderators, nobody else (404 for them). */
export function reviewThreadRoutes(config: Config): Router {
  const r = Router();
  const postLimit = limiter(config, { windowMs: 10 * 60_000, limit: 20, what: 'review-thread posts', perUser: true });
  r.get(
    '/api/builds/:buildId/review-thread',
    requireUser,
    route({ params: buildIdParams }, async ({ actor, params, res }) => {
      res.json(await getReviewThread(actor, params.buildId));
    }),
  );
  r.post(
    '/api/builds/:buildId/review-thread',
    requireUser,
    postLimit,
    route({ params: buildIdParams, body: createReviewPostInput }, async ({ actor, params, body, res }) => {
      res.status(201).json(await postToReviewThread(actor, params.buildId, body));
    }),
  );
  return r;
}
