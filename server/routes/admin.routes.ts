import { Router } from 'express';
import { listUsersQuery, setRoleInput, setSuspendedInput, userIdParams } from '@shared/schemas/user.ts';
import { requireUser } from '../middleware/auth.ts';
import { listUsers, setUserRole, setUserSuspended } from '../services/user.service.ts';
import { route } from './route.ts';

/** The admin's user list, roles and suspensions. */
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
  return r;
}
