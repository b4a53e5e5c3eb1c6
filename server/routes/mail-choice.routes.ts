import { Router } from 'express';
import { unsubscribeParams } from '@shared/schemas/mail-choices.ts';
import { unsubscribe, unsubscribeState } from '../services/mail-choices.service.ts';
import { route } from './route.ts';

/** The one-click address (the List-Unsubscribe header's), which other sites' servers may POST. */
export const ONE_CLICK_UNSUBSCRIBE = /^\/api\/mail\/unsubscribe\/[^/]+\/[^/]+\/[^/]+\/?$/i;

/**
 * One-click unsubscribe (RFC 8058). The signed link is the credential, so these routes sit before sessions
 * and CSRF, and the same-origin check lets them through: a mail provider POSTs `List-Unsubscribe=One-Click` from its own servers,
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
