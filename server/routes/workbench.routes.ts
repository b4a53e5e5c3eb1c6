import { Router } from 'express';
import { fitInput } from '@shared/schemas/workbench.ts';
import { validate } from '../middleware/validate.ts';
import { computeFit } from '../services/workbench.service.ts';

/** Pure calculations; no sign-in, nothing stored. */
export function workbenchRoutes(): Router {
  const r = Router();
  r.post('/api/workbench/fit', validate(fitInput), (_req, res) => {
    res.json(computeFit(res.locals.body));
  });
  return r;
}
