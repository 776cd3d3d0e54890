import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op, type Transaction, type WhereOptions } from 'sequelize';
import { asUiLanguage, NOTIFICATION_KINDS, type NotificationKind, type NotificationPage, type NotificationPreferences } from '@mantlepiece/shared';
import { Clock } from '../clock/clock.service.js';
import { pageWindow, toPage } from '../common/page.js';
import { MailService } from '../mail/mail.service.js';
import type { User } from '../users/models/user.model.js';
import type { ListNotificationsQuery, MarkReadDto, NotificationPreferencesDto } from './dto/notifications.dto.js';
import { NotificationPreference } from './models/notification-preference.model.js';
import { Notification } from './models/notification.model.js';
import { wordNotification, type NotificationEvent } from './notification-words.js';
import { toNotificationView } from './notifications.presenter.js';

@Injectable()
export class NotificationsService {
  constructor(
    @InjectModel(Notification) private readonly notifications: typeof Notification,
    @InjectModel(NotificationPreference) private readonly preferences: typeof NotificationPreference,
    private readonly mail: MailService,
    private readonly clock: Clock,
  ) {}

  /**
   * Tells each recipient in the studio and, unless they turned this kind off, by e-mail, both worded
   * in their UI language. Runs in the caller's transaction, so nobody hears of a change that did not commit.
   */
  async notify(recipients: readonly User[], event: NotificationEvent, link: string, transaction: Transaction): Promise<void> {
    if (recipients.length === 0) return;
    const mailOff = new Set(
      (await this.preferences.findAll({ where: { userId: recipients.map((person) => person.id), kind: event.kind, email: false }, transaction }))
        .map((preference) => preference.userId),
    );
    for (const person of recipients) {
      const language = asUiLanguage(person.uiLanguage);
      const { title, body } = wordNotification(event, language);
      await this.notifications.create({ recipientId: person.id, kind: event.kind, title, body, link, readAt: null, createdAt: this.clock.now() }, { transaction });
      if (mailOff.has(person.id)) continue;
      await this.mail.enqueue(person.email, language, { kind: 'notification', name: person.name, subject: title, body, link: this.mail.studioLink(link) }, transaction);
    }
  }

  async list(person: User, query: ListNotificationsQuery): Promise<NotificationPage> {
    const mine = { recipientId: person.id };
    const where: WhereOptions<Notification> = query.unread === 'true' ? { ...mine, readAt: null } : mine;
    const [{ rows, count }, unread] = await Promise.all([
      this.notifications.findAndCountAll({ where, order: [['createdAt', 'DESC'], ['id', 'DESC']], ...pageWindow(query) }),
      this.notifications.count({ where: { ...mine, readAt: null } }),
    ]);
    return { ...toPage(rows.map(toNotificationView), count, query), unread };
  }

  /** Marks the person's own notifications read; ids of someone else's are left alone. */
  async markRead(person: User, dto: MarkReadDto): Promise<void> {
    if (!dto.all && !dto.ids?.length) return;
    const which = dto.all ? {} : { id: { [Op.in]: dto.ids! } };
    await this.notifications.update({ readAt: this.clock.now() }, { where: { recipientId: person.id, readAt: null, ...which } });
  }

  async preferencesOf(person: User): Promise<NotificationPreferences> {
    const rows = await this.preferences.findAll({ where: { userId: person.id } });
    const emailOf = (kind: NotificationKind) => rows.find((row) => row.kind === kind)?.email ?? true;
    return Object.fromEntries(NOTIFICATION_KINDS.map((kind) => [kind, { email: emailOf(kind) }])) as NotificationPreferences;
  }

  async setPreferences(person: User, dto: NotificationPreferencesDto): Promise<NotificationPreferences> {
    for (const kind of NOTIFICATION_KINDS) {
      const choice = dto[kind];
      if (choice) await this.preferences.upsert({ userId: person.id, kind, email: choice.email });
    }
    return this.preferencesOf(person);
  }
}
