import type { RequestHandler } from 'express';

/**
 * passport.session(), and when the session names a user who is now suspended or gone, the whole
 * session ends (row deleted, CSRF token with it), just as suspending someone deletes their sessions;
 * otherwise such a session would live on as a visitor's and answer differently.
 */
export function sessionUser(passportSession: RequestHandler): RequestHandler {
  return (req, res, next) => {
    const named = (req.session as { passport?: { user?: unknown } } | undefined)?.passport?.user;
    passportSession(req, res, (err?: unknown) => {
      if (err || named === undefined || req.user) return next(err);
      req.session.regenerate((e) => next(e));
    });
  };
}
