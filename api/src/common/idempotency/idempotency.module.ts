import { Module } from '@nestjs/common';
import { IdempotencyInterceptor } from './idempotency.interceptor.js';
import { IdempotencyRepository } from './idempotency.repository.js';
import { IdempotencyService } from './idempotency.service.js';
import { IdempotencySweeper } from './idempotency.sweeper.js';

/** Import into a feature module whose controllers use @Idempotent(). */
@Module({
  providers: [IdempotencyRepository, IdempotencyService, IdempotencyInterceptor, IdempotencySweeper],
  exports: [IdempotencyService, IdempotencyInterceptor, IdempotencySweeper],
})
export class IdempotencyModule {}
