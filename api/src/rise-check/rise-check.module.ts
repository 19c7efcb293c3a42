import { Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { FeedingModule } from '../feeding/feeding.module.js';
import { RiseCheckController } from './rise-check.controller.js';
import { RiseCheckRepository } from './rise-check.repository.js';
import { RiseCheckService } from './rise-check.service.js';

@Module({
  imports: [FeedingModule, IdempotencyModule],
  controllers: [RiseCheckController],
  providers: [RiseCheckRepository, RiseCheckService],
})
export class RiseCheckModule {}
