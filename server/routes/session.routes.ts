import { Router } from 'express';
import type { SessionDto } from '@shared/schemas/user.ts';
import type { User } from '../models/user.model.ts';
import { presentSessionUser } from '../presenters/user.presenter.ts';
import { csrfTokenFor } from '../middleware/csrf.ts';

export function sessionRoutes(): Router {
  const r = Router();
  r.get('/api/session', (req, res) => {
    const user = req.user as User | undefined;
    const dto: SessionDto = { user: user ? presentSessionUser(user) : null, csrfToken: csrfTokenFor(req) };
    res.set('Cache-Control', 'no-store').json(dto);
  });
  return r;
}
