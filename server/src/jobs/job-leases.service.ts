import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { Clock } from '../clock/clock.service.js';
import { unclaimedAt } from './claim-queue.js';
import { JobOwner } from './job-owner.js';
import { JobLease } from './models/job-lease.model.js';

/**
 * Named leases for periodic tasks that one instance at a time should run. The holder keeps its
 * lease by taking it again on every run; another instance gets it only once it ran out (the
 * holder died) or was given back (the holder stopped).
 */
@Injectable()
export class JobLeases {
  constructor(
    @InjectModel(JobLease) private readonly leases: typeof JobLease,
    private readonly owner: JobOwner,
    private readonly clock: Clock,
  ) {}

  /** Takes or keeps the lease for `leaseMs` more; false while another instance holds it. */
  async hold(name: string, leaseMs: number): Promise<boolean> {
    await this.leases.bulkCreate([{ name }], { ignoreDuplicates: true });
    const now = this.clock.now();
    // mysql2 counts matched rows (FOUND_ROWS), so keeping a lease at an unchanged expiry still counts as held.
    const [held] = await this.leases.update(
      { claimedBy: this.owner.id, claimExpiresAt: new Date(now.getTime() + leaseMs) },
      { where: { name, [Op.or]: [{ claimedBy: this.owner.id }, unclaimedAt(now)] } },
    );
    return held === 1;
  }

  /** Gives the lease back if this instance holds it, so another takes over without waiting for it to run out. */
  async release(name: string): Promise<void> {
    await this.leases.update({ claimedBy: null, claimExpiresAt: null }, { where: { name, claimedBy: this.owner.id } });
  }
}
