import { Router } from 'express';
import type { PassportStatic } from 'passport';
import type { RequestHandler } from 'express';
import { sendSession } from './session.routes.ts';

/** Only same-site paths are allowed as a place to return to after sign-in. */
function safeReturnTo(value: unknown): string | undefined {
  return typeof value === 'string' && /^\/(?!\/)[^\s\\]*$/.test(value) && !value.startsWith('/auth/') ? value : undefined;
}

export function authRoutes(passport: PassportStatic, signInLimiter: RequestHandler): Router {
  const r = Router();

  r.get('/auth/github', signInLimiter, (req, res, next) => {
    const returnTo = safeReturnTo(req.query.returnTo);
    if (returnTo) req.session.returnTo = returnTo;
    const login = typeof req.query.login === 'string' ? req.query.login.slice(0, 39) : undefined;
    passport.authenticate('github', { login } as object)(req, res, next);
  });

  r.get('/auth/github/callback', (req, res, next) => {
    passport.authenticate('github', (err: unknown, user: Express.User | false, info?: { message?: string }) => {
      if (err) return next(err);
      if (!user) {
        const reason = info?.message === 'account_suspended' ? 'suspended' : 'failed';
        return res.redirect(302, `/?signin=${reason}`);
      }
      const returnTo = req.session.returnTo ?? '/';
      // passport 0.7 regenerates the session id inside logIn, so a fixed id cannot be carried over.
      req.logIn(user, (e) => (e ? next(e) : res.redirect(302, returnTo)));
    })(req, res, next);
  });

  r.post('/auth/logout', (req, res, next) => {
    // passport 0.7 deletes the signed-in session and gives the request a new, empty one (no fixation).
    req.logout((err) => {
      if (err) return next(err);
      // The answer is that new session with its CSRF token (stored first), so the page needs no second read after
      // signing out: a read still in flight when the user starts signing in again could set its own session cookie
      // over the one holding the sign-in's OAuth state.
      sendSession(req, res).catch(next);
    });
  });

  return r;
}
