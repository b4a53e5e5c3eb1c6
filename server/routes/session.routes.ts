import { Router, type Request, type Response } from 'express';
import type { SessionDto } from '@shared/schemas/user.ts';
import { presentSessionUser } from '../presenters/user.presenter.ts';
import { csrfTokenFor } from '../middleware/csrf.ts';

/**
 * Answer with the request's session: who is signed in and its CSRF token. A new token is stored before it is handed
 * out: express-session would save only after the response is on the wire, where a database failure can no longer
 * become a 503.
 */
export async function sendSession(req: Request, res: Response): Promise<void> {
  const user = req.user as Parameters<typeof presentSessionUser>[0] | undefined;
  const fresh = !req.session.csrfToken;
  const dto: SessionDto = { user: user ? presentSessionUser(user) : null, csrfToken: csrfTokenFor(req) };
  if (fresh) await new Promise<void>((resolve, reject) => req.session.save((err) => (err ? reject(err) : resolve())));
  res.set('Cache-Control', 'no-store').json(dto);
}

export function sessionRoutes(): Router {
  const r = Router();
  r.get('/api/session', sendSession);
  return r;
}
