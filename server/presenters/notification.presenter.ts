import type { NotificationDto } from '@shared/schemas/notification.ts';
import type { Notification } from '../models/notification.model.ts';

export function presentNotification(n: Notification): NotificationDto {
  return { id: n.id, kind: n.kind, text: n.text, path: n.path, read: n.readAt !== null, createdAt: n.createdAt.toISOString() };
}
