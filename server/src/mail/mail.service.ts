import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import { renderMail, type MailContent } from './mail-templates.js';
import { OutboxMessage } from './models/outbox-message.model.js';

/** Puts mail in the outbox; the outbox worker sends it. */
@Injectable()
export class MailService {
  constructor(
    @InjectModel(OutboxMessage) private readonly outbox: typeof OutboxMessage,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  /** A link to a studio page, as the recipient will open it. */
  studioLink(path: string): string {
    return `${this.config.publicUrl}${path}`;
  }

  /** Queues a message in the caller's transaction, so it is sent exactly when the change commits. */
  async enqueue(recipient: string, uiLanguage: string, content: MailContent, transaction?: Transaction): Promise<OutboxMessage> {
    const { subject, text, html } = renderMail(content, uiLanguage);
    return this.outbox.create(
      { recipient, subject, textBody: text, htmlBody: html, attempts: 0, nextAttemptAt: this.clock.now() },
      { transaction },
    );
  }
}
