import { Router } from 'express';
import type { SessionDto } from '@shared/schemas/user.ts';
import { presentSessionUser } from '../presenters/user.presenter.ts';
import { csrfTokenFor } from '../middleware/csrf.ts';

export function sessionRoutes(): Router {
  const r = Router();
  r.get('/api/session', async (req, res) => {
    const user = req.user as Parameters<typeof presentSessionUser>[0] | undefined;
    const fresh = !req.session.csrfToken;
    const dto: SessionDto = { user: user ? presentSessionUser(user) : null, csrfToken: csrfTokenFor(req) };
    // Store a new token before handing it out: express-session would save only after the response
    // is on the wire, where a database failure can no longer become a 503.
    if (fresh) await new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
    res.set('Cache-Control', 'no-store').json(dto);
  });
  return r;
}
