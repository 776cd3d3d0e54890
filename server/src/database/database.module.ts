import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ConfigService } from '../config/config.service.js';
import { User } from '../users/models/user.model.js';
import { VenueMembership } from '../users/models/venue-membership.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { replicationOptions } from './replica-reads.js';
import { boundedSequelizeOptions } from './sequelize-options.js';

/** The app's connection. Models come from each feature's forFeature (people and venues also here); the schema only from migrations. */
@Module({
  imports: [
    SequelizeModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => {
        const bounded = boundedSequelizeOptions(config.databaseUrl, {
          connectTimeoutMs: config.dbConnectTimeoutMs,
          acquireTimeoutMs: config.dbAcquireTimeoutMs,
          statementTimeoutMs: config.dbStatementTimeoutMs,
        });
        const replication = replicationOptions(config.databaseUrl, config.databaseReplicaUrls);
        return {
          ...bounded,
          ...replication,
          hooks: { ...bounded.hooks, ...replication.hooks },
          autoLoadModels: true,
          // People and venues first: nearly every feature's models point at them, whichever module loads first.
          models: [User, VenueMembership, Venue],
          synchronize: false,
        };
      },
    }),
  ],
})
export class DatabaseModule {}
