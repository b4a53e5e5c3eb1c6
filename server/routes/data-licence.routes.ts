import { Router } from 'express';
import { requireUser } from '../middleware/auth.ts';
import { acceptDataLicence, getDataLicenceAcceptance } from '../services/data-licence.service.ts';
import { route } from './route.ts';

/** The data licence a maker accepts once for what they contribute (runs are not refused without it). */
export function dataLicenceRoutes(): Router {
  const r = Router();
  r.get(
    '/api/account/data-licence',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.set('Cache-Control', 'no-store').json(await getDataLicenceAcceptance(actor));
    }),
  );
  r.post(
    '/api/account/data-licence',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json(await acceptDataLicence(actor));
    }),
  );
  return r;
}
