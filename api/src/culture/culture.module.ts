import { Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { CultureController } from './culture.controller.js';
import { CultureRepository } from './culture.repository.js';
import { CultureService } from './culture.service.js';

@Module({
  imports: [IdempotencyModule],
  controllers: [CultureController],
  providers: [CultureRepository, CultureService],
  exports: [CultureService],
})
export class CultureModule {}
