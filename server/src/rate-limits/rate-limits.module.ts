import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { RateLimitCounter } from './models/rate-limit.model.js';
import { RateLimitsService } from './rate-limits.service.js';

@Module({
  imports: [SequelizeModule.forFeature([RateLimitCounter])],
  providers: [RateLimitsService],
  exports: [RateLimitsService],
})
export class RateLimitsModule {}
