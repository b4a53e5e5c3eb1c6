import { Router } from 'express';
import { markNotificationsReadInput, notificationsQuery } from '@shared/schemas/notification.ts';
import { requireUser } from '../middleware/auth.ts';
import { listNotifications, markNotificationsRead, unreadCounts } from '../services/notification.service.ts';
import { route } from './route.ts';

/** One's own notifications (newest first), marking them read, and the navigation's unread badges. */
export function notificationRoutes(): Router {
  const r = Router();
  r.get(
    '/api/notifications',
    requireUser,
    route({ query: notificationsQuery }, async ({ actor, query, res }) => {
      res.json(await listNotifications(actor, query));
    }),
  );
  r.get(
    '/api/notifications/counts',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json(await unreadCounts(actor));
    }),
  );
  r.post(
    '/api/notifications/read',
    requireUser,
    route({ body: markNotificationsReadInput }, async ({ actor, body, res }) => {
      res.json(await markNotificationsRead(actor, body));
    }),
  );
  return r;
}
