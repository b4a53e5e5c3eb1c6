import type { RequestHandler } from 'express';
import { UnauthorizedError } from '../errors.ts';

/** Authentication only (401 before any body validation); what the person may do is decided in services. */
export const requireUser: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : new UnauthorizedError());
};
