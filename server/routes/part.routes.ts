import { Router } from 'express';
import { listPartsQuery, partIdParams } from '@shared/schemas/part.ts';
import { validate } from '../middleware/validate.ts';
import { actorOf } from '../middleware/actor.ts';
import { getPart, listParts } from '../services/part.service.ts';

/** The parts registry (read side). */
export function partRoutes(): Router {
  const r = Router();
  r.get('/api/parts', validate(listPartsQuery, 'query'), async (_req, res) => {
    res.json(await listParts(res.locals.query));
  });
  r.get('/api/parts/:partId', validate(partIdParams, 'params'), async (req, res) => {
    res.json(await getPart(actorOf(req), res.locals.params.partId));
  });
  return r;
}
