import { Injectable, Logger, OnApplicationBootstrap, OnApplicationShutdown } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import { MailTransport } from './mail-transport.js';
import { OutboxMessage } from './models/outbox-message.model.js';

const CLAIM_MS = 60_000;
const FIRST_RETRY_MS = 30_000;
const LONGEST_RETRY_MS = 60 * 60_000;
const BATCH = 20;

/** Wait before the next try after `attempts` failures: doubling from 30 s, at most an hour. Never gives up. */
export const retryDelayMs = (attempts: number): number =>
  Math.min(FIRST_RETRY_MS * 2 ** Math.max(attempts - 1, 0), LONGEST_RETRY_MS);

export interface DeliveryReport {
  sent: number[];
  failed: number[];
}

/**
 * Sends what is due in the outbox. Each message is claimed with a conditional update first, so
 * several server instances can poll the same table without sending a message twice.
 */
@Injectable()
export class MailOutboxWorker implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('MailOutbox');
  private timer?: NodeJS.Timeout;
  private running = false;

  constructor(
    @InjectModel(OutboxMessage) private readonly outbox: typeof OutboxMessage,
    private readonly transport: MailTransport,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {}

  onApplicationBootstrap(): void {
    if (this.config.mailPollIntervalMs === 0) return;
    this.timer = setInterval(() => void this.poll(), this.config.mailPollIntervalMs);
    this.timer.unref();
  }

  onApplicationShutdown(): void {
    clearInterval(this.timer);
    this.transport.close();
  }

  async deliverDue(): Promise<DeliveryReport> {
    const report: DeliveryReport = { sent: [], failed: [] };
    const now = this.clock.now();
    const unclaimed = { [Op.or]: [{ lockedUntil: null }, { lockedUntil: { [Op.lt]: now } }] };
    const due = await this.outbox.findAll({
      where: { sentAt: null, nextAttemptAt: { [Op.lte]: now }, ...unclaimed },
      order: [['nextAttemptAt', 'ASC'], ['id', 'ASC']],
      limit: BATCH,
    });
    for (const message of due) {
      const [claimed] = await this.outbox.update(
        { lockedUntil: new Date(now.getTime() + CLAIM_MS) },
        { where: { id: message.id, sentAt: null, ...unclaimed } },
      );
      if (claimed === 1) await this.deliver(message, report);
    }
    return report;
  }

  private async deliver(message: OutboxMessage, report: DeliveryReport): Promise<void> {
    const attempts = message.attempts + 1;
    try {
      await this.transport.send({ to: message.recipient, subject: message.subject, text: message.textBody, html: message.htmlBody });
      await this.settle(message, { attempts, sentAt: this.clock.now(), lockedUntil: null, lastError: null });
      report.sent.push(message.id);
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      await this.settle(message, {
        attempts,
        nextAttemptAt: this.clock.fromNow(retryDelayMs(attempts)),
        lockedUntil: null,
        lastError: reason.slice(0, 1000),
      });
      report.failed.push(message.id);
      this.logger.warn(`message ${message.id} to ${message.recipient} not sent (try ${attempts}): ${reason}`);
    }
  }

  /** By id, not through the instance: the instance never saw the claim, so it would skip clearing it. */
  private async settle(message: OutboxMessage, outcome: Partial<OutboxMessage>): Promise<void> {
    await this.outbox.update(outcome, { where: { id: message.id } });
  }

  private async poll(): Promise<void> {
    if (this.running) return;
    this.running = true;
    try {
      await this.deliverDue();
    } catch (error) {
      this.logger.error(`outbox poll failed: ${error instanceof Error ? error.message : String(error)}`);
    } finally {
      this.running = false;
    }
  }
}
