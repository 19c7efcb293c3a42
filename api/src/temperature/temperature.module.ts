import { Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { FeedingModule } from '../feeding/feeding.module.js';
import { TemperatureController } from './temperature.controller.js';
import { TemperatureRepository } from './temperature.repository.js';
import { TemperatureService } from './temperature.service.js';

@Module({
  imports: [FeedingModule, IdempotencyModule],
  controllers: [TemperatureController],
  providers: [TemperatureRepository, TemperatureService],
})
export class TemperatureModule {}
