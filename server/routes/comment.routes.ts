import { Router } from 'express';
import { buildIdParams } from '@shared/schemas/build.ts';
import { commentIdParams, createCommentInput, hideCommentInput } from '@shared/schemas/comment.ts';
import type { Config } from '../config.ts';
import { limiter } from '../middleware/rate-limit.ts';
import { requireUser } from '../middleware/auth.ts';
import { createComment, hideComment, listComments } from '../services/comment.service.ts';
import { route } from './route.ts';

/** Comments on published builds: read by anyone, written by signed-in makers (rate limited), hidden by moderators. */
export function commentRoutes(config: Config): Router {
  const r = Router();
  const commentLimit = limiter(config, { windowMs: 10 * 60_000, limit: 10, what: 'comments', perUser: true });
  r.get(
    '/api/builds/:buildId/comments',
    route({ params: buildIdParams }, async ({ actor, params, res }) => {
      res.json({ items: await listComments(actor, params.buildId) });
    }),
  );
  r.post(
    '/api/builds/:buildId/comments',
    requireUser,
    commentLimit,
    route({ params: buildIdParams, body: createCommentInput }, async ({ actor, params, body, res }) => {
      res.status(201).json(await createComment(actor, params.buildId, body));
    }),
  );
  r.post(
    '/api/comments/:commentId/hide',
    requireUser,
    route({ params: commentIdParams, body: hideCommentInput }, async ({ actor, params, body, res }) => {
      await hideComment(actor, params.commentId, body);
      res.status(204).end();
    }),
  );
  return r;
}
