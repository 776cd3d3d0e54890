import { Injectable } from '@nestjs/common';
import type { ModelStatic } from 'sequelize';
import { Sequelize, type Model } from 'sequelize-typescript';
import { Clock } from '../clock/clock.service.js';
import { ClaimQueue, type Claimable } from './claim-queue.js';
import { JobOwner } from './job-owner.js';

/** Makes the claim queue of a work table, claiming as this running app. */
@Injectable()
export class JobClaims {
  constructor(
    private readonly sequelize: Sequelize,
    private readonly clock: Clock,
    private readonly owner: JobOwner,
  ) {}

  /** `leaseMs`: how long a claim lasts without being pushed on before another instance may take the row. */
  queue<M extends Model & Claimable>(model: ModelStatic<M>, leaseMs: number): ClaimQueue<M> {
    return new ClaimQueue(model, this.sequelize, this.clock, this.owner.id, leaseMs);
  }
}
