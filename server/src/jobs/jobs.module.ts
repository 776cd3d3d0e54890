import { Global, Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { BackgroundJobs } from './background-jobs.service.js';
import { JobClaims } from './job-claims.service.js';
import { JobLeases } from './job-leases.service.js';
import { JobOwner } from './job-owner.js';
import { JobLease } from './models/job-lease.model.js';

/** Background work that holds with several server instances: claims with an owner and an expiry, leases, polling loops. */
@Global()
@Module({
  imports: [SequelizeModule.forFeature([JobLease])],
  providers: [JobOwner, JobClaims, JobLeases, BackgroundJobs],
  exports: [JobOwner, JobClaims, JobLeases, BackgroundJobs],
})
export class JobsModule {}
