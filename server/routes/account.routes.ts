import { Router } from 'express';
import { accountSettingsInput } from '@shared/schemas/review.ts';
import { requireUser } from '../middleware/auth.ts';
import { getAccountSettings, updateAccountSettings } from '../services/account.service.ts';
import { route } from './route.ts';

/** The signed-in maker's own settings (the mail opt-out). */
export function accountRoutes(): Router {
  const r = Router();
  r.get(
    '/api/account/settings',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json(await getAccountSettings(actor));
    }),
  );
  r.patch(
    '/api/account/settings',
    requireUser,
    route({ body: accountSettingsInput }, async ({ actor, body, res }) => {
      res.json(await updateAccountSettings(actor, body));
    }),
  );
  return r;
}
