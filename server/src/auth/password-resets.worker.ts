import { Injectable, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '../config/config.service.js';
import { BackgroundJobs } from '../jobs/background-jobs.service.js';
import { PasswordResetsService } from './password-resets.service.js';

/** Turns queued reset requests into mailed links, on the outbox's beat (tests drive it by hand). */
@Injectable()
export class PasswordResetsWorker implements OnModuleInit {
  constructor(
    private readonly resets: PasswordResetsService,
    private readonly jobs: BackgroundJobs,
    private readonly config: ConfigService,
  ) {}

  onModuleInit(): void {
    this.jobs.register({ name: 'password-reset-links', intervalMs: this.config.mailPollIntervalMs, run: () => this.resets.mailRequestedLinks() });
  }
}
