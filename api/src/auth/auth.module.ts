import { Module } from '@nestjs/common';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import { APP_CONFIG, type AppConfig } from '../config.js';
import { AccountModule } from '../account/account.module.js';
import { AuthController } from './auth.controller.js';
import { LocalStrategy } from './local.strategy.js';

@Module({
  imports: [
    PassportModule,
    AccountModule,
    // Counted in memory per process: enough for one server; several would need a shared store.
    ThrottlerModule.forRootAsync({
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({
        throttlers: [{ name: 'auth', ttl: 60_000, limit: config.authAttemptsPerMinute }],
        errorMessage: 'Too many attempts from here. Wait a minute, then try again.',
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [LocalStrategy],
})
export class AuthModule {}
