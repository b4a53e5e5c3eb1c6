import { Router } from 'express';
import { mailIdParams } from '@shared/schemas/outbox.ts';
import { requireUser } from '../middleware/auth.ts';
import { listGivenUpMails, requeueMail } from '../services/outbox-admin.service.ts';
import { route } from './route.ts';

/** Admins: mails the outbox gave up on, and putting one back in the queue. */
export function outboxRoutes(): Router {
  const r = Router();
  r.get(
    '/api/admin/outbox/given-up',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json(await listGivenUpMails(actor));
    }),
  );
  r.post(
    '/api/admin/outbox/:mailId/requeue',
    requireUser,
    route({ params: mailIdParams }, async ({ actor, params, res }) => {
      res.json(await requeueMail(actor, params.mailId));
    }),
  );
  return r;
}
