import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { SequelizeModule } from '@nestjs/sequelize';
import { ConfigService } from '../config/config.service.js';
import { MailModule } from '../mail/mail.module.js';
import { RateLimitsModule } from '../rate-limits/rate-limits.module.js';
import { UsersModule } from '../users/users.module.js';
import { AccessTokenService } from './access-token.service.js';
import { AuthController } from './auth.controller.js';
import { AuthGuard } from './auth.guard.js';
import { AuthService } from './auth.service.js';
import { PasswordResetRequest } from './models/password-reset-request.model.js';
import { PasswordReset } from './models/password-reset.model.js';
import { RefreshToken } from './models/refresh-token.model.js';
import { PasswordResetsService } from './password-resets.service.js';
import { PasswordResetsWorker } from './password-resets.worker.js';
import { RefreshTokensService } from './refresh-tokens.service.js';
import { SignInAttemptsService } from './sign-in-attempts.service.js';
import { BearerStrategy } from './strategies/bearer.strategy.js';
import { LocalStrategy } from './strategies/local.strategy.js';

@Module({
  imports: [
    SequelizeModule.forFeature([RefreshToken, PasswordReset, PasswordResetRequest]),
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => ({ secret: config.jwtSecret, signOptions: { algorithm: 'HS256' }, verifyOptions: { algorithms: ['HS256'] } }),
    }),
    PassportModule,
    RateLimitsModule,
    UsersModule,
    MailModule,
  ],
  controllers: [AuthController],
  providers: [
    AuthService, AccessTokenService, RefreshTokensService, SignInAttemptsService, PasswordResetsService, PasswordResetsWorker,
    LocalStrategy, BearerStrategy,
    // Every route of every module passes this guard; @Public() and @Roles() say how.
    { provide: APP_GUARD, useClass: AuthGuard },
  ],
})
export class AuthModule {}
