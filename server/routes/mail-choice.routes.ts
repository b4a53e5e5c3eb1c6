import { Router } from 'express';
import { unsubscribeParams } from '@shared/schemas/mail-choices.ts';
import { unsubscribe, unsubscribeState } from '../services/mail-choices.service.ts';
import { route } from './route.ts';

/**
 * One-click unsubscribe (RFC 8058). The signed link is the credential, so these routes sit before sessions,
 * the same-origin check and CSRF: a mail provider POSTs `List-Unsubscribe=One-Click` from its own servers,
 * without cookies. The body is not read (RFC 8058 §3.1 fixes it). GET only says what the link would stop.
 */
export function mailChoiceRoutes(): Router {
  const r = Router();
  r.get(
    '/api/mail/unsubscribe/:userId/:kind/:token',
    route({ params: unsubscribeParams }, async ({ params, res }) => {
      res.set('Cache-Control', 'no-store').json(await unsubscribeState(params));
    }),
  );
  r.post(
    '/api/mail/unsubscribe/:userId/:kind/:token',
    route({ params: unsubscribeParams }, async ({ params, res }) => {
      res.set('Cache-Control', 'no-store').json(await unsubscribe(params));
    }),
  );
  return r;
}
