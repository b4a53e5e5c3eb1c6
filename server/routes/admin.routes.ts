import { Router } from 'express';
import { listUsersQuery, setRoleInput, setSuspendedInput, userIdParams, userTokenParams } from '@shared/schemas/user.ts';
import { requireUser } from '../middleware/auth.ts';
import { listUsers, setUserRole, setUserSuspended } from '../services/user.service.ts';
import { listUserTokens, revokeUserToken } from '../services/admin-token.service.ts';
import { route } from './route.ts';

/** The admin's user list, roles, suspensions and others' API tokens. */
export function adminRoutes(): Router {
  const r = Router();
  r.get(
    '/api/admin/users',
    requireUser,
    route({ query: listUsersQuery }, async ({ actor, query, res }) => {
      res.json(await listUsers(actor, query));
    }),
  );
  r.patch(
    '/api/admin/users/:userId/role',
    requireUser,
    route({ params: userIdParams, body: setRoleInput }, async ({ actor, params, body, res }) => {
      res.json(await setUserRole(actor, params.userId, body));
    }),
  );
  r.patch(
    '/api/admin/users/:userId/suspension',
    requireUser,
    route({ params: userIdParams, body: setSuspendedInput }, async ({ actor, params, body, res }) => {
      res.json(await setUserSuspended(actor, params.userId, body));
    }),
  );
  r.get(
    '/api/admin/users/:userId/tokens',
    requireUser,
    route({ params: userIdParams }, async ({ actor, params, res }) => {
      res.json(await listUserTokens(actor, params.userId));
    }),
  );
  r.delete(
    '/api/admin/users/:userId/tokens/:tokenId',
    requireUser,
    route({ params: userTokenParams }, async ({ actor, params, res }) => {
      await revokeUserToken(actor, params.userId, params.tokenId);
      res.status(204).end();
    }),
  );
  return r;
}
