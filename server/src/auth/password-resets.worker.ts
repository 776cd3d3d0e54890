import { Injectable, Logger, OnApplicationBootstrap, OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '../config/config.service.js';
import { PasswordResetsService } from './password-resets.service.js';

/** Turns queued reset requests into mailed links, on the outbox's beat (tests drive it by hand). */
@Injectable()
export class PasswordResetsWorker implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('PasswordResets');
  private timer?: NodeJS.Timeout;
  private running = false;

  constructor(
    private readonly resets: PasswordResetsService,
    private readonly config: ConfigService,
  ) {}

  onApplicationBootstrap(): void {
    if (this.config.mailPollIntervalMs === 0) return;
    this.timer = setInterval(() => void this.poll(), this.config.mailPollIntervalMs);
    this.timer.unref();
  }

  onApplicationShutdown(): void {
    clearInterval(this.timer);
  }

  private async poll(): Promise<void> {
    if (this.running) return;
    this.running = true;
    try {
      await this.resets.mailRequestedLinks();
    } catch (error) {
      this.logger.error(`reset requests not processed: ${error instanceof Error ? error.message : String(error)}`);
    } finally {
      this.running = false;
    }
  }
}
