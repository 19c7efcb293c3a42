import { Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { CultureSummaryController } from './culture-summary.controller.js';
import { CultureSummaryRepository } from './culture-summary.repository.js';
import { CultureSummaryService, SummaryClock } from './culture-summary.service.js';
import { CultureController } from './culture.controller.js';
import { CultureRepository } from './culture.repository.js';
import { CultureService } from './culture.service.js';

@Module({
  imports: [IdempotencyModule],
  controllers: [CultureController, CultureSummaryController],
  providers: [CultureRepository, CultureService, CultureSummaryRepository, CultureSummaryService, SummaryClock],
  exports: [CultureService, CultureSummaryRepository],
})
export class CultureModule {}
