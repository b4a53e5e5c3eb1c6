import { Router } from 'express';
import { apiTokenIdParams, createApiTokenInput } from '@shared/schemas/api-token.ts';
import { requireUser } from '../middleware/auth.ts';
import { createApiToken, listApiTokens, revokeApiToken } from '../services/api-token.service.ts';
import { route } from './route.ts';

/** The signed-in maker's personal API tokens (a browser session only: tokens never reach these, see token-scopes.ts). */
export function apiTokenRoutes(): Router {
  const r = Router();
  r.get(
    '/api/account/tokens',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json(await listApiTokens(actor));
    }),
  );
  r.post(
    '/api/account/tokens',
    requireUser,
    route({ body: createApiTokenInput }, async ({ actor, body, res }) => {
      res
        .status(201)
        .set('Cache-Control', 'no-store')
        .json(await createApiToken(actor, body));
    }),
  );
  r.delete(
    '/api/account/tokens/:tokenId',
    requireUser,
    route({ params: apiTokenIdParams }, async ({ actor, params, res }) => {
      await revokeApiToken(actor, params.tokenId);
      res.status(204).end();
    }),
  );
  return r;
}
