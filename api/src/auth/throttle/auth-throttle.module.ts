import { Module } from '@nestjs/common';
import { AuthThrottleRepository } from './auth-throttle.repository.js';
import { PgThrottlerStorage } from './pg-throttler.storage.js';

@Module({
  providers: [AuthThrottleRepository, PgThrottlerStorage],
  exports: [AuthThrottleRepository, PgThrottlerStorage],
})
export class AuthThrottleModule {}
