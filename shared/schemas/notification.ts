import { z } from 'zod';

/** What a notification is about: a decision, a review-thread post, a comment, or news from something followed. */
export const NOTIFICATION_KINDS = ['review', 'review-thread', 'comment', 'follow-entry', 'follow-run', 'follow-build'] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const notificationsQuery = z.strictObject({
  /** Older than this id (the next page). */
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(100).default(30),
});
export type NotificationsQuery = z.infer<typeof notificationsQuery>;

/** Mark some (by id) or, with no ids, all of one's notifications read. */
export const markNotificationsReadInput = z.strictObject({
  ids: z.array(z.number().int().positive()).min(1).max(200).optional(),
});
export type MarkNotificationsReadInput = z.infer<typeof markNotificationsReadInput>;

export interface NotificationDto {
  id: number;
  kind: NotificationKind;
  text: string;
  /** The page it is about, on this site. */
  path: string;
  read: boolean;
  createdAt: string;
}

export interface NotificationsDto {
  items: NotificationDto[];
  /** Unread notifications in all, not only on this page. */
  unread: number;
  /** Pass as `before` for the next page; null at the end. */
  nextBefore: number | null;
}

/** What the navigation's badges count. */
export interface UnreadCountsDto {
  notifications: number;
  messages: number;
}
