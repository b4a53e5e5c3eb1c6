// What each person is told in the app: a row per person and event, unread until they mark it read.
// The badges in the navigation count unread notifications and unread exchange messages.
import { Op, QueryTypes, type Transaction } from 'sequelize';
import type { Actor } from '@shared/policies.ts';
import type {
  MarkNotificationsReadInput,
  NotificationKind,
  NotificationsDto,
  NotificationsQuery,
  UnreadCountsDto,
} from '@shared/schemas/notification.ts';
import { Notification } from '../models/notification.model.ts';
import { authorize } from '../policies/authorize.ts';
import { presentNotification } from '../presenters/notification.presenter.ts';

/** Longest text a notification keeps (the column's size). */
const MAX_TEXT = 400;

/** Tell these people (once each, never the one who caused it) about something, in the caller's transaction. */
export async function notify(
  userIds: Iterable<number>,
  what: { kind: NotificationKind; text: string; path: string },
  opts: { except?: number | null; transaction?: Transaction },
): Promise<number[]> {
  const ids = [...new Set(userIds)].filter((id) => id !== opts.except);
  if (!ids.length) return [];
  const text = what.text.length > MAX_TEXT ? `${what.text.slice(0, MAX_TEXT - 1)}…` : what.text;
  await Notification.bulkCreate(
    ids.map((userId) => ({ userId, kind: what.kind, text, path: what.path })),
    { transaction: opts.transaction },
  );
  return ids;
}

export async function listNotifications(actor: Actor | null, query: NotificationsQuery): Promise<NotificationsDto> {
  authorize(actor, 'notification.read', { userId: actor?.id });
  const rows = await Notification.findAll({
    where: { userId: actor.id, ...(query.before ? { id: { [Op.lt]: query.before } } : {}) },
    order: [['id', 'DESC']],
    limit: query.limit + 1,
  });
  const page = rows.slice(0, query.limit);
  const unread = await Notification.count({ where: { userId: actor.id, readAt: null } });
  return {
    items: page.map(presentNotification),
    unread,
    nextBefore: rows.length > query.limit ? page[page.length - 1]!.id : null,
  };
}

/** Mark the named notifications (or all) read; ids that are not the actor's are ignored. Answers the new unread count. */
export async function markNotificationsRead(actor: Actor | null, input: MarkNotificationsReadInput): Promise<{ unread: number }> {
  authorize(actor, 'notification.read', { userId: actor?.id });
  await Notification.update({ readAt: new Date() }, { where: { userId: actor.id, readAt: null, ...(input.ids ? { id: input.ids } : {}) } });
  return { unread: await Notification.count({ where: { userId: actor.id, readAt: null } }) };
}

/** The navigation's badges: unread notifications, and messages from others not yet read in one's conversations. */
export async function unreadCounts(actor: Actor | null): Promise<UnreadCountsDto> {
  authorize(actor, 'notification.read', { userId: actor?.id });
  const [notifications, [messages]] = await Promise.all([
    Notification.count({ where: { userId: actor.id, readAt: null } }),
    Notification.sequelize!.query<{ n: number }>(
      `SELECT COUNT(*) AS n FROM messages m JOIN message_threads t ON t.id = m.thread_id
        WHERE (t.owner_id = :me OR t.starter_id = :me) AND m.sender_id <> :me AND m.read_at IS NULL`,
      { replacements: { me: actor.id }, type: QueryTypes.SELECT },
    ),
  ]);
  return { notifications, messages: Number(messages?.n ?? 0) };
}
