import { Injectable, Logger, OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { Clock } from '../clock/clock.service.js';
import { ConfigService } from '../config/config.service.js';
import { BackgroundJobs } from '../jobs/background-jobs.service.js';
import type { ClaimQueue } from '../jobs/claim-queue.js';
import { JobClaims } from '../jobs/job-claims.service.js';
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
 * Sends what is due in the outbox. Messages are claimed first (see ClaimQueue), so several server
 * instances can poll the same table without sending a message twice; a message claimed by an
 * instance that died is sent by another once the claim runs out.
 */
@Injectable()
export class MailOutboxWorker implements OnModuleInit, OnApplicationShutdown {
  private readonly logger = new Logger('MailOutbox');
  private readonly queue: ClaimQueue<OutboxMessage>;

  constructor(
    @InjectModel(OutboxMessage) outbox: typeof OutboxMessage,
    claims: JobClaims,
    private readonly jobs: BackgroundJobs,
    private readonly transport: MailTransport,
    private readonly clock: Clock,
    private readonly config: ConfigService,
  ) {
    this.queue = claims.queue(outbox, CLAIM_MS);
  }

  onModuleInit(): void {
    this.jobs.register({
      name: 'mail-outbox',
      intervalMs: this.config.mailPollIntervalMs,
      run: async () => {
        const { sent, failed } = await this.deliverDue();
        return sent.length + failed.length;
      },
    });
  }

  onApplicationShutdown(): void {
    this.transport.close();
  }

  async deliverDue(): Promise<DeliveryReport> {
    const report: DeliveryReport = { sent: [], failed: [] };
    const due = await this.queue.claim(
      { sentAt: null, nextAttemptAt: { [Op.lte]: this.clock.now() } },
      { order: [['nextAttemptAt', 'ASC'], ['id', 'ASC']], limit: BATCH },
    );
    for (const message of due) await this.deliver(message, report);
    return report;
  }

  private async deliver(message: OutboxMessage, report: DeliveryReport): Promise<void> {
    const attempts = message.attempts + 1;
    try {
      await this.transport.send({ to: message.recipient, subject: message.subject, text: message.textBody, html: message.htmlBody });
      await this.queue.settle(message.id, { attempts, sentAt: this.clock.now(), lastError: null });
      report.sent.push(message.id);
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      await this.queue.settle(message.id, { attempts, nextAttemptAt: this.clock.fromNow(retryDelayMs(attempts)), lastError: reason.slice(0, 1000) });
      report.failed.push(message.id);
      this.logger.warn(`message ${message.id} to ${message.recipient} not sent (try ${attempts}): ${reason}`);
    }
  }
}
