import { Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { CultureModule } from '../culture/culture.module.js';
import { FeedingController } from './feeding.controller.js';
import { FeedingRepository } from './feeding.repository.js';
import { FeedingService } from './feeding.service.js';

@Module({
  imports: [CultureModule, IdempotencyModule],
  controllers: [FeedingController],
  providers: [FeedingRepository, FeedingService],
  exports: [FeedingService],
})
export class FeedingModule {}
