import { Router } from 'express';
import { followParams } from '@shared/schemas/follow.ts';
import { requireUser } from '../middleware/auth.ts';
import { follow, followState, listFollows, unfollow } from '../services/follow.service.ts';
import { route } from './route.ts';

/** Follow a build, a part or a maker; see what one follows. */
export function followRoutes(): Router {
  const r = Router();
  r.get(
    '/api/follows/mine',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json({ items: await listFollows(actor) });
    }),
  );
  r.get(
    '/api/follows/:targetType/:targetId',
    route({ params: followParams }, async ({ actor, params, res }) => {
      res.json(await followState(actor, params));
    }),
  );
  r.put(
    '/api/follows/:targetType/:targetId',
    requireUser,
    route({ params: followParams }, async ({ actor, params, res }) => {
      res.json(await follow(actor, params));
    }),
  );
  r.delete(
    '/api/follows/:targetType/:targetId',
    requireUser,
    route({ params: followParams }, async ({ actor, params, res }) => {
      await unfollow(actor, params);
      res.status(204).end();
    }),
  );
  return r;
}
