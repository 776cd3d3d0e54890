import type { NotificationView } from '@mantlepiece/shared';
import type { Notification } from './models/notification.model.js';

export const toNotificationView = (notification: Notification): NotificationView => ({
  id: notification.id,
  kind: notification.kind,
  title: notification.title,
  body: notification.body,
  link: notification.link,
  readAt: notification.readAt?.toISOString() ?? null,
  createdAt: notification.createdAt.toISOString(),
});
