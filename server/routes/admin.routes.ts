import { Router } from 'express';
import { listUsersQuery, setRoleInput, setSuspendedInput, userIdParams } from '@shared/schemas/user.ts';
import { validate } from '../middleware/validate.ts';
import { requireUser } from '../middleware/auth.ts';
import { actorOf } from '../middleware/actor.ts';
import { listUsers, setUserRole, setUserSuspended } from '../services/user.service.ts';

export function adminRoutes(): Router {
  const r = Router();
  r.get('/api/admin/users', requireUser, validate(listUsersQuery, 'query'), async (req, res) => {
    res.json(await listUsers(actorOf(req), res.locals.query));
  });
  r.patch('/api/admin/users/:userId/role', requireUser, validate(userIdParams, 'params'), validate(setRoleInput), async (req, res) => {
    res.json(await setUserRole(actorOf(req), res.locals.params.userId, res.locals.body));
  });
  r.patch(
    '/api/admin/users/:userId/suspension',
    requireUser,
    validate(userIdParams, 'params'),
    validate(setSuspendedInput),
    async (req, res) => {
      res.json(await setUserSuspended(actorOf(req), res.locals.params.userId, res.locals.body));
    },
  );
  return r;
}
