import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { ConfigService } from '../config/config.service.js';
import { boundedSequelizeOptions } from './sequelize-options.js';

/** The app's connection. Models come from each feature's forFeature; the schema only from migrations. */
@Module({
  imports: [
    SequelizeModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => ({
        ...boundedSequelizeOptions(config.databaseUrl, {
          connectTimeoutMs: config.dbConnectTimeoutMs,
          acquireTimeoutMs: config.dbAcquireTimeoutMs,
          statementTimeoutMs: config.dbStatementTimeoutMs,
        }),
        autoLoadModels: true,
        synchronize: false,
      }),
    }),
  ],
})
export class DatabaseModule {}
