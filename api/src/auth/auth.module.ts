import { Module } from '@nestjs/common';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import { APP_CONFIG, type AppConfig } from '../config.js';
import { AccountModule } from '../account/account.module.js';
import { AuthController } from './auth.controller.js';
import { LocalStrategy } from './local.strategy.js';
import { AuthThrottleModule } from './throttle/auth-throttle.module.js';
import { PgThrottlerStorage } from './throttle/pg-throttler.storage.js';
import { SignInLimitsService } from './throttle/sign-in-limits.service.js';

@Module({
  imports: [
    PassportModule,
    AccountModule,
    AuthThrottleModule,
    // ThrottlerModule is global: the password-reset routes use the same guard and storage.
    // Counted in PostgreSQL (PgThrottlerStorage), so several API processes share one allowance.
    ThrottlerModule.forRootAsync({
      imports: [AuthThrottleModule],
      inject: [APP_CONFIG, PgThrottlerStorage],
      useFactory: (config: AppConfig, storage: PgThrottlerStorage) => ({
        // Named `default` so the guard's header is plain Retry-After (RFC 9110 §10.2.3).
        throttlers: [{ name: 'default', ttl: 60_000, limit: config.authAttemptsPerMinute }],
        storage,
        errorMessage: 'Too many attempts from here. Wait a minute, then try again.',
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [LocalStrategy, SignInLimitsService],
})
export class AuthModule {}
